namespace ErrorBudget.Core.Simulation;

/// <summary>
/// How to execute a run. None of these change a result: the counter-based random numbers make
/// every figure identical for any thread count, tile size and trial block.
/// </summary>
public sealed record RunOptions
{
    /// <summary>Worker threads. Range: 1 .. 1024.</summary>
    public int Threads { get; init; } = Environment.ProcessorCount;

    /// <summary>Users per tile, the unit of parallel work. Range: 1 .. 65,536.</summary>
    public int TileSize { get; init; } = 16;

    /// <summary>
    /// Trials whose satellite errors are held in memory at once (per epoch). Runs with more trials
    /// loop over blocks, recomputing the geometry once per block; memory stays independent of the
    /// number of trials. Range: 1 .. 65,536.
    /// </summary>
    public int TrialBlock { get; init; } = 2048;

    /// <summary>
    /// Vectorised hot loop (Vector256) when the hardware accelerates it; false forces the scalar twin,
    /// which tests hold to the same answers.
    /// </summary>
    public bool UseSimd { get; init; } = true;

    /// <summary>Called from worker threads with (completed work units, total units).</summary>
    public Action<long, long>? Progress { get; init; }

    /// <summary>Tool version recorded in the metadata.</summary>
    public string ToolVersion { get; init; } = "0.0.0";

    /// <summary>Time each stage of the kernel (RunResult.Stages); for the benchmark, costs a few per cent.</summary>
    public bool MeasureStages { get; init; }
}

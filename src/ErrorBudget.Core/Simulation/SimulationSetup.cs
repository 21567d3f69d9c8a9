using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Simulation;

/// <summary>What a run derives once from the scenario before sampling anything.</summary>
internal sealed class SimulationSetup
{
    /// <summary>Relative accuracy of every percentile sketch (DDSketch alpha).</summary>
    public const double SketchAccuracy = 0.005;

    /// <summary>
    /// Position errors (HPE, VPE) at or below this count in the sketches' zero bucket, m. No error budget
    /// resolves a millimetre, and the low tail below it (a folded normal's smallest values reach
    /// sigma / n) held a third of a cell's buckets: on the 1-degree grid that decided whether a run fits
    /// in 1 GiB (issue 6). A percentile at or below it reads 0.
    /// </summary>
    public const double PositionErrorResolutionMeters = 1e-3;

    public SimulationSetup(Scenario scenario, RunOptions options)
    {
        Scenario = scenario;
        Seed = scenario.Run.Seed;
        Grid = ServiceGrid.From(scenario.Grid);
        Constellation = Constellation.FromShells(scenario.Shells);
        Epochs = scenario.Run.Epochs;
        Trials = scenario.Run.Trials;
        BlockCapacity = Math.Min(Trials, options.TrialBlock);
        Blocks = (Trials + BlockCapacity - 1) / BlockCapacity;
        LaneCapacity = (BlockCapacity + NormalBatch - 1) / NormalBatch * NormalBatch;
        StartRotationAngleRad = EarthRotation.EarthRotationAngle(scenario.Run.StartUtc);
        Weights = AreaWeights.For(Grid, (long)Epochs * Trials);
        var tiles = new List<Tile>();
        for (int first = 0, k = 0; first < Grid.Count; first += options.TileSize, k++)
        {
            tiles.Add(new Tile(k, first, Math.Min(options.TileSize, Grid.Count - first)));
        }

        Tiles = tiles;
    }

    public Scenario Scenario { get; }
    public ulong Seed { get; }
    public ServiceGrid Grid { get; }
    public Constellation Constellation { get; }
    public int Epochs { get; }
    public int Trials { get; }
    public int BlockCapacity { get; }
    public int Blocks { get; }

    /// <summary>Trials per block rounded up to whole normal batches: the kernel computes padded lanes and discards them.</summary>
    public int LaneCapacity { get; }

    /// <summary>Epochs a tile job covers in a row (cache reuse of the tile's cell sketches).</summary>
    public const int EpochsPerBatch = 8;

    /// <summary>
    /// Trials per vector of the kernel's wide path (Vector512 of float; the narrow path takes 8) and a
    /// whole group of the user-level normal generator (sixteen Box-Muller halves). Blocks are padded to
    /// a multiple of it so either path has whole vectors and no user-level normal falls to the
    /// generator's slower scalar tail.
    /// </summary>
    public const int NormalBatch = 16;
    public double StartRotationAngleRad { get; }
    public AreaWeights Weights { get; }
    public IReadOnlyList<Tile> Tiles { get; }

    /// <summary>Work units for progress: tile jobs over all epochs and blocks.</summary>
    public long TotalJobs => (long)Epochs * Blocks * Tiles.Count;
}

namespace ErrorBudget.Core.Relativity;

/// <summary>The relativity figures of a scenario: one row per satellite, and the position error the missed terms cause.</summary>
/// <param name="Satellites">One row per satellite, in constellation order.</param>
/// <param name="Position">Position error of the missed terms alone at sampled users.</param>
/// <param name="SampledEpochs">Epochs behind the user-level and position figures (every k-th epoch of the run).</param>
public sealed record RelativityReport(
    IReadOnlyList<RelativitySatelliteFigures> Satellites,
    RelativityPositionFigures Position,
    int SampledEpochs)
{
    /// <summary>No satellites (a result built without a run).</summary>
    public static RelativityReport Empty { get; } = new([], new RelativityPositionFigures(0, default, default, default), 0);
}

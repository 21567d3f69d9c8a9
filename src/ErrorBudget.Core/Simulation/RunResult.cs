using ErrorBudget.Core.Relativity;
using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Simulation;

/// <summary>Everything a finished run produced, ready for a result-set writer.</summary>
public sealed record RunResult(
    Scenario Scenario,
    RunMetadata Metadata,
    IReadOnlyList<CellResult> Cells,
    IReadOnlyList<EpochResult> Epochs,
    GlobalFigures Global)
{
    /// <summary>relativity.parquet and the check report: per-satellite relativistic figures (issue 4).</summary>
    public RelativityReport Relativity { get; init; } = RelativityReport.Empty;
    /// <summary>Model and simulated Allan deviation of the clock grade in use (empty for the simple clock model).</summary>
    public IReadOnlyList<ClockAdevRow> Clocks { get; init; } = [];

    /// <summary>Clock and orbit range errors by age of data (empty when the run drew no satellite errors).</summary>
    public IReadOnlyList<AgeOfDataRow> AgeOfData { get; init; } = [];

    /// <summary>[integrity] (issue 5): protection levels, availability, integrity events, diagram, overbounding; null without the table.</summary>
    public IntegrityReport? Integrity { get; init; }

    /// <summary>Batch-means confidence intervals of the global percentiles; null with fewer than 2 batches.</summary>
    public BatchIntervals? Intervals { get; init; }

    /// <summary>True for the exact path (Gaussian mixture quantiles, no sampling): see Exact.ExactEngine.</summary>
    public bool Exact { get; init; }

    /// <summary>Thread time per stage when RunOptions.MeasureStages was on; otherwise null.</summary>
    public StageTimes? Stages { get; init; }
}

/// <summary>Provenance of a run, written into every table's key-value metadata and the summary.</summary>
/// <param name="ScenarioHash">SHA-256 of the scenario text, lower-case hex.</param>
/// <param name="Seed">The seed actually used (scenario or --seed).</param>
/// <param name="Trials">The trials actually run (scenario or --trials).</param>
/// <param name="ToolVersion">Assembly informational version.</param>
/// <param name="Threads">Worker threads used (does not change any result).</param>
/// <param name="StartedUtc">Wall-clock start of the run.</param>
/// <param name="RunSeconds">Wall-clock duration of the simulation.</param>
public sealed record RunMetadata(
    string ScenarioHash,
    ulong Seed,
    int Trials,
    string ToolVersion,
    int Threads,
    DateTimeOffset StartedUtc,
    double RunSeconds);

/// <summary>
/// Service-area figures: percentiles of the area-weighted pooled distribution of all samples, and
/// the worst cell by the 95th percentile.
/// </summary>
public sealed record GlobalFigures(
    long Samples,
    double UnavailableFraction,
    PercentileSet Hpe,
    PercentileSet Vpe,
    WorstCell WorstHpe,
    WorstCell WorstVpe);

/// <summary>The cell with the largest 95th percentile of a quantity (NaN/-1 when no cell has samples).</summary>
public sealed record WorstCell(int CellIndex, double LatDeg, double LonDeg, double P95Meters);

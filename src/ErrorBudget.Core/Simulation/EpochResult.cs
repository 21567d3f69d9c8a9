namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Service-area figures at one epoch (a row of epochs.parquet): area-weighted over the cells,
/// pooled over the trials.
/// </summary>
public sealed record EpochResult(
    int EpochIndex,
    double TimeSeconds,
    DateTimeOffset Utc,
    long Samples,
    double UnavailableFraction,
    double SatsInViewMean,
    double PdopP50,
    double PdopP95,
    PercentileSet Hpe,
    PercentileSet Vpe);

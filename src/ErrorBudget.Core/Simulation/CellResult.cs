namespace ErrorBudget.Core.Simulation;

/// <summary>
/// One grid cell's figures over all epochs and trials (a row of cells.parquet). Percentiles are
/// NaN where the cell has too few samples to support them (see <see cref="PercentileSet"/>).
/// </summary>
public sealed record CellResult(
    int CellIndex,
    double LatDeg,
    double LonDeg,
    double AreaWeight,
    long Samples,
    double UnavailableFraction,
    double SatsInViewMean,
    double PdopP50,
    double PdopP95,
    double HdopP95,
    double VdopP95,
    PercentileSet Hpe,
    PercentileSet Vpe);

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// 95 % batch-means confidence intervals of the global HPE and VPE percentiles: the trials split into
/// <see cref="Batches"/> independent batches, each batch's pooled percentile an estimate, Student t
/// with Batches - 1 degrees of freedom on their spread, widened by the sketch's relative accuracy
/// (0.5 %) on each side because each batch estimate is a sketch bucket's value.
/// </summary>
public sealed record BatchIntervals(int Batches, IReadOnlyList<PercentileInterval> Hpe, IReadOnlyList<PercentileInterval> Vpe)
{
    public const double Confidence = 0.95;
}

/// <summary>One percentile's batch-means interval (m).</summary>
public sealed record PercentileInterval(double Level, double Mean, double Lower, double Upper);

namespace ErrorBudget.Core.Statistics;

/// <summary>Exact sample quantiles of a sorted set, with the same rank convention as <see cref="DDSketch"/>.</summary>
public static class ExactQuantile
{
    /// <summary>
    /// The q-quantile x_(max(1, ceil(q n))) of <paramref name="sortedAscending"/> (1-based order
    /// statistic, lower inverse CDF). Range: q in [0, 1]; NaN for an empty set.
    /// </summary>
    public static double Of(ReadOnlySpan<double> sortedAscending, double q)
    {
        if (sortedAscending.IsEmpty)
        {
            if (!(q >= 0.0 && q <= 1.0))
            {
                throw new ArgumentOutOfRangeException(nameof(q), q, "The quantile level must be in [0, 1].");
            }

            return double.NaN;
        }

        return sortedAscending[(int)QuantileRank.Target(q, sortedAscending.Length) - 1];
    }
}

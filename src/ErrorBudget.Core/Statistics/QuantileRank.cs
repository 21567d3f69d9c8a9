namespace ErrorBudget.Core.Statistics;

/// <summary>The rank convention shared by <see cref="DDSketch"/> and <see cref="ExactQuantile"/>.</summary>
internal static class QuantileRank
{
    // q and the product q * n each carry a relative rounding error of at most 2^-53; 1e-14 (~45 ulp)
    // absorbs both, so 0.95 * 100 lands on rank 95 and not 96.
    private const double RelativeTolerance = 1e-14;

    /// <summary>
    /// The 1-based rank of the q-quantile of n weighted samples: max(1, ceil(q n)), the lower inverse
    /// of the empirical CDF. Range: q in [0, 1], n &gt;= 1; the result is in [1, n].
    /// </summary>
    public static long Target(double q, long n)
    {
        if (!(q >= 0.0 && q <= 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(q), q, "The quantile level must be in [0, 1].");
        }

        double exact = q * n;
        double rank = Math.Ceiling(exact - RelativeTolerance * exact);
        return Math.Clamp((long)rank, 1L, n);
    }
}

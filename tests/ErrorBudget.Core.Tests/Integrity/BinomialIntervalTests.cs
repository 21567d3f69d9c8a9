using ErrorBudget.Core.Integrity;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.RootFinding;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// Clopper-Pearson interval (Clopper &amp; Pearson 1934; the defining tail equations P(X ≥ k | L) = α/2 and
/// P(X ≤ k | U) = α/2 for X ~ Binomial(n, p) are the textbook definition): closed forms at the edges, an
/// independent solution of the tail equations, and exact coverage by enumeration.
/// </summary>
public class BinomialIntervalTests
{
    [Theory]
    [InlineData(1L)]
    [InlineData(10L)]
    [InlineData(1000L)]
    [InlineData(1_000_000L)]
    [InlineData(1_000_000_000L)]
    public void Zero_events_give_the_closed_form_upper_bound(long n)
    {
        // Derived: P(X ≤ 0 | p) = (1 − p)ⁿ = α/2 ⇒ U = 1 − (α/2)^(1/n); L = 0 exactly.
        // n = 10 gives U = 0.308497 (derived). Reference by a Taylor series, independent of the tool's expm1.
        const double RelativeTolerance = 1e-12;
        var (lower, upper) = BinomialInterval.ClopperPearson(0, n, 0.95);
        double expected = OneMinusExp(Math.Log(0.025) / n);
        Assert.Equal(0.0, lower);
        Assert.Equal(expected, upper, RelativeTolerance * expected);
        if (n == 10)
        {
            Assert.Equal(0.308497, upper, 1e-6); // printed to 6 decimals
        }
    }

    [Fact]
    public void Zero_events_at_ninety_percent_two_sided_follow_the_rule_of_three()
    {
        // Common practice ("rule of three"): with no events in n trials the one-sided 95 % upper bound is ≈ 3/n,
        // exactly −ln(0.05)/n = 2.9957/n to first order; the second-order term is 1.5/n relative (1.5e-6 here).
        const long n = 1_000_000;
        double upper = BinomialInterval.ClopperPearson(0, n, 0.90).Upper;
        Assert.Equal(-Math.Log(0.05) / n, upper, 1e-5 * upper);
    }

    [Theory]
    [InlineData(1L)]
    [InlineData(25L)]
    [InlineData(1_000_000_000L)]
    public void All_events_give_the_closed_form_lower_bound(long n)
    {
        // Derived: P(X ≥ n | p) = pⁿ = α/2 ⇒ L = (α/2)^(1/n); U = 1 exactly.
        const double Tolerance = 1e-14;
        var (lower, upper) = BinomialInterval.ClopperPearson(n, n, 0.95);
        Assert.Equal(1.0 - OneMinusExp(Math.Log(0.025) / n), lower, Tolerance);
        Assert.Equal(1.0, upper);
    }

    [Theory]
    [InlineData(1_000L)]
    [InlineData(1_000_000L)]
    [InlineData(100_000_000L)]
    [InlineData(1_000_000_000L)]
    public void One_event_lower_bound_keeps_its_relative_precision_at_rare_event_scale(long n)
    {
        // Derived: P(X ≥ 1 | p) = 1 − (1 − p)ⁿ = α/2 ⇒ L = 1 − (1 − α/2)^(1/n) ≈ 0.0253/n.
        // Tolerance: MathNet's incomplete beta forms ln Γ(n + 1) − ln Γ(n) from two numbers near n ln n, each with
        // ~2.2e-16 relative round-off, so the CDF (and L) carry ~n ln n · 2.2e-16 relative error; twice that plus
        // 1e-12 is allowed (4e-12 at n = 1e3, 9e-6 at n = 1e9; measured 9e-13 and 8e-7).
        // (MathNet's own Beta.InvCDF, accurate to 1e-8 absolute, would miss L = 2.5e-11 entirely.)
        double relativeTolerance = 1e-12 + (2.0 * n * Math.Log(n) * 2.2e-16);
        double lower = BinomialInterval.ClopperPearson(1, n, 0.95).Lower;
        double expected = OneMinusExp(Log1p(-0.025) / n);
        Assert.Equal(expected, lower, relativeTolerance * expected);
    }

    [Theory]
    [InlineData(1L, 50L)]
    [InlineData(3L, 50L)]
    [InlineData(10L, 50L)]
    [InlineData(25L, 50L)]
    [InlineData(40L, 50L)]
    [InlineData(49L, 50L)]
    [InlineData(7L, 12L)]
    public void Bounds_solve_the_tail_equations_of_an_independent_binomial_sum(long k, long n)
    {
        // Independent reference: the binomial CDF summed term by term from the pmf recursion, and each tail equation
        // solved by MathNet bisection to 1e-14. Both sides are accurate to ~1e-14 in p here (measured 6e-14): tolerance 1e-12.
        const double Tolerance = 1e-12;
        var (lower, upper) = BinomialInterval.ClopperPearson(k, n, 0.95);
        double expectedLower = Bisection.FindRoot(p => (1.0 - CdfBySum(k - 1, n, p)) - 0.025, 1e-12, 1 - 1e-12, 1e-14);
        double expectedUpper = Bisection.FindRoot(p => CdfBySum(k, n, p) - 0.025, 1e-12, 1 - 1e-12, 1e-14);
        Assert.Equal(expectedLower, lower, Tolerance);
        Assert.Equal(expectedUpper, upper, Tolerance);
    }

    [Fact]
    public void Bounds_for_ten_events_in_a_hundred_million_solve_the_tail_equations()
    {
        // The regime of a misleading-information count. Independent reference as above, with the pmf recursion
        // started from exp(n log1p(−p)) (Kahan's log1p); MathNet bisection on the expected count λ = n p to 1e-13.
        // Tolerance 1e-7 relative: the ln Γ(n) round-off bound of the rare-event test above is 8e-7 at n = 1e8; measured 7e-9.
        const long n = 100_000_000, k = 10;
        var (lower, upper) = BinomialInterval.ClopperPearson(k, n, 0.95);
        double expectedLower = Bisection.FindRoot(m => (1.0 - CdfBySum(k - 1, n, m / n)) - 0.025, 0.1, 100, 1e-13) / n;
        double expectedUpper = Bisection.FindRoot(m => CdfBySum(k, n, m / n) - 0.025, 0.1, 100, 1e-13) / n;
        Assert.Equal(expectedLower, lower, 1e-7 * expectedLower);
        Assert.Equal(expectedUpper, upper, 1e-7 * expectedUpper);
        // Sanity against the Poisson-limit (Garwood) bounds for 10 events, 4.795 and 18.39 (from memory of the tables).
        Assert.InRange(lower * n, 4.79, 4.80);
        Assert.InRange(upper * n, 18.38, 18.40);
    }

    [Theory]
    [InlineData(20L, 0.95)]
    [InlineData(20L, 0.80)]
    [InlineData(7L, 0.95)]
    public void Each_tail_misses_the_true_probability_at_most_half_alpha_by_exact_enumeration(long n, double confidence)
    {
        // The defining property of the exact interval: for every p, P(L(X) > p) ≤ α/2 and P(U(X) < p) ≤ α/2,
        // hence coverage ≥ 1 − α. Exact enumeration over X = 0..n with MathNet's binomial pmf (no sampling).
        const double Slack = 1e-12;
        double halfAlpha = 0.5 * (1.0 - confidence);
        var bounds = Enumerable.Range(0, (int)n + 1).Select(k => BinomialInterval.ClopperPearson(k, n, confidence)).ToArray();
        foreach (double p in new[] { 0.001, 0.02, 0.1, 0.27, 0.5, 0.64, 0.9, 0.995 })
        {
            double missLow = 0, missHigh = 0;
            for (int k = 0; k <= n; k++)
            {
                double pmf = Binomial.PMF(p, (int)n, k);
                missLow += bounds[k].Lower > p ? pmf : 0.0;
                missHigh += bounds[k].Upper < p ? pmf : 0.0;
            }

            Assert.True(missLow <= halfAlpha + Slack, $"p = {p}: P(L > p) = {missLow} > α/2 = {halfAlpha}");
            Assert.True(missHigh <= halfAlpha + Slack, $"p = {p}: P(U < p) = {missHigh} > α/2 = {halfAlpha}");
            Assert.True(1.0 - missLow - missHigh >= confidence - Slack);
        }
    }

    [Fact]
    public void Interval_is_mirror_symmetric_ordered_and_contains_the_observed_rate()
    {
        // Derived from X ↦ n − X: L(k, n) = 1 − U(n − k, n). Round-off of 1 − (1 − x): 2.2e-16.
        const long n = 30;
        const double Tolerance = 4.5e-16;
        for (long k = 0; k <= n; k++)
        {
            var (lower, upper) = BinomialInterval.ClopperPearson(k, n, 0.99);
            var mirror = BinomialInterval.ClopperPearson(n - k, n, 0.99);
            Assert.Equal(lower, 1.0 - mirror.Upper, Tolerance);
            Assert.True(lower <= (double)k / n && (double)k / n <= upper);
            if (k > 0)
            {
                var previous = BinomialInterval.ClopperPearson(k - 1, n, 0.99);
                Assert.True(previous.Lower < lower && previous.Upper < upper, "bounds must increase with k");
            }
        }

        // A higher confidence gives a wider interval.
        var narrow = BinomialInterval.ClopperPearson(5, 100, 0.90);
        var wide = BinomialInterval.ClopperPearson(5, 100, 0.999);
        Assert.True(wide.Lower < narrow.Lower && wide.Upper > narrow.Upper);
    }

    [Theory]
    [InlineData(0L, 0L, 0.95, "trials")]
    [InlineData(-1L, 10L, 0.95, "events")]
    [InlineData(11L, 10L, 0.95, "events")]
    [InlineData(1L, 10L, 0.0, "confidence")]
    [InlineData(1L, 10L, 1.0, "confidence")]
    [InlineData(1L, 10L, double.NaN, "confidence")]
    public void Invalid_arguments_are_rejected(long events, long trials, double confidence, string parameter)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => BinomialInterval.ClopperPearson(events, trials, confidence));
        Assert.Equal(parameter, e.ParamName);
    }

    /// <summary>P(X ≤ k) for X ~ Binomial(n, p) by summing the pmf recursion f(j+1) = f(j)(n − j)/(j + 1) · p/(1 − p).</summary>
    private static double CdfBySum(long k, long n, double p)
    {
        if (k < 0)
        {
            return 0.0;
        }

        double term = Math.Exp(n * Log1p(-p));
        double sum = term;
        double ratio = p / (1.0 - p);
        for (long j = 0; j < k; j++)
        {
            term *= (double)(n - j) / (j + 1) * ratio;
            sum += term;
        }

        return Math.Min(sum, 1.0);
    }

    /// <summary>ln(1 + x), Kahan's formulation (accurate to a few ulps for small x).</summary>
    private static double Log1p(double x)
    {
        double u = 1.0 + x;
        return u == 1.0 ? x : Math.Log(u) * x / (u - 1.0);
    }

    /// <summary>1 − exp(u) for u ≤ 0: Taylor series to u⁵ when |u| &lt; 1e-3 (remainder &lt; 1e-18 relative), else direct.</summary>
    private static double OneMinusExp(double u) =>
        Math.Abs(u) < 1e-3
            ? -u * (1.0 + (u / 2.0 * (1.0 + (u / 3.0 * (1.0 + (u / 4.0 * (1.0 + (u / 5.0))))))))
            : 1.0 - Math.Exp(u);
}

using ErrorBudget.Core.Integrity;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Integrity;

public class OverboundAnalysisTests
{
    private const int N = 1_000_000;

    // Upper bound on the reported tolerance, from the rule itself: every evaluated edge has relative standard
    // error rho <= 0.01 and there are at most 1537 edges, so the union bound sum Q(tau / rho_i) = 1e-3 gives
    // tau <= 0.01 * Phi^-1(1 - 1e-3 / 1537) = 0.01 * 4.84.
    private static readonly double MaxTolerance =
        OverboundAnalysis.DefaultMaxRelativeError * -Normal.InvCDF(0, 1, OverboundAnalysis.ToleranceFalseAlarm / 1537);

    [Fact]
    public void A_true_unit_Gaussian_needs_an_inflation_of_one_within_the_sampling_tolerance()
    {
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Gaussian(1, N));
        Assert.InRange(r.SamplingTolerance, 0.0, MaxTolerance); // 0.048
        // Truth = assumption: every k_i = 1 (1 + rho_i Z_i), so |k - 1| <= MaxTolerance except with probability <= 2e-3.
        Assert.InRange(r.RequiredInflation, 1.0 - MaxTolerance, 1.0 + MaxTolerance);
        Assert.Equal(N, r.Samples);
    }

    [Fact]
    public void At_a_million_samples_the_check_reaches_a_tail_mass_of_1e_minus_4()
    {
        // At tail mass 1e-4 (q = 3.72) the rule's rho = sqrt(1e-4 / 1e6) / (phi(3.72) 3.72) = 0.0068 <= 0.01
        // and the tail holds ~100 >= 20 samples, so edges at least that deep pass; the next edge down is
        // at most exp(3.72 / 64) = 6 % shallower, hence 1.1e-4. No edge can pass with fewer than 20 samples.
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Gaussian(2, N));
        Assert.InRange(r.TailProbabilityChecked, 20.0 / N, 1.1e-4);
    }

    [Fact]
    public void A_Gaussian_twice_as_wide_as_assumed_needs_an_inflation_of_two()
    {
        // k_i = 2 q_i / q^_i: the same relative noise as for the unit Gaussian, so the band scales by 2.
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Gaussian(3, N, sigma: 2.0));
        Assert.InRange(r.RequiredInflation, 2.0 * (1.0 - MaxTolerance), 2.0 * (1.0 + MaxTolerance));
        Assert.False(r.Bounded);
    }

    [Fact]
    public void A_Gaussian_narrower_than_assumed_is_bounded()
    {
        // sigma = 0.8: k = 0.8 (1 +- 0.048) < 1.
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Gaussian(4, N, sigma: 0.8));
        Assert.InRange(r.RequiredInflation, 0.8 * (1.0 - MaxTolerance), 0.8 * (1.0 + MaxTolerance));
        Assert.True(r.Bounded);
    }

    [Fact]
    public void A_missed_bias_of_half_a_sigma_cannot_be_overbounded_by_any_zero_mean_Gaussian()
    {
        // N(0.5, 1): at the first edge x = 1/64 > 0, F = Phi(1/64 - 0.5) = 0.314 < 1/2 with rho = 0.0027
        // (evaluated); F - 1/2 is ~400 binomial standard deviations, so the verdict is certain: k infinite.
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Gaussian(5, N, bias: 0.5));
        Assert.True(double.IsPositiveInfinity(r.RequiredInflation));
        Assert.InRange(r.CriticalX, 0.0, 0.5); // the wrong-side median shows between 0 and the bias
        Assert.False(r.Bounded);
    }

    [Fact]
    public void A_bias_of_a_twentieth_of_sigma_fails_although_the_sigma_ratio_is_one()
    {
        // N(0.05, 1): k(x) = x / (x - 0.05) for x > 0.05, largest at the first evaluated edge. The edge
        // x = 12/64 has rho = 0.0091 <= 0.01 (evaluated) and k = 0.1875 / 0.1375 = 1.364; edge 11/64 has
        // rho = 0.0103 (left out). With 4.5 rho of noise, k >= 1.364 (1 - 4.5 * 0.0091) = 1.30.
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Gaussian(6, N, bias: 0.05));
        // s^2 lies in the chi-square band 1 +- 0.0064 at n = 1e6 (4.5 sigma), so s in 1 +- 0.0032; 0.0064 is loose.
        Assert.InRange(r.SigmaRatio, 1 - 0.0064, 1 + 0.0064);
        Assert.True(r.RequiredInflation >= 1.30, $"k = {r.RequiredInflation}");
        Assert.True(r.RequiredInflation > 1.0 + r.SamplingTolerance);
    }

    [Fact]
    public void A_unit_variance_Laplace_needs_inflation_as_its_CDF_predicts_in_the_deep_tail()
    {
        // Laplace b = 1/sqrt(2) (variance 2 b^2 = 1). The same-variance Gaussian does not overbound its tails;
        // k(x) = x / Phi^-1(F_L(x)) grows with |x|. The rule reaches at least tail mass 1e-4 (see the
        // Gaussian reach test: the rule depends on F only), where k = x / Phi^-1(1e-4) with
        // x = ln(2e-4) / sqrt(2): 1.619. So k >= 1.619 (1 - MaxTolerance).
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Laplace(7, N, 1.0 / Math.Sqrt(2.0)));
        Assert.True(r.RequiredInflation >= LaplaceK(1e-4) * (1 - MaxTolerance), $"k = {r.RequiredInflation}");
        Assert.True(r.RequiredInflation > 1.0 + r.SamplingTolerance);
        // The variance is right, only the shape fails: sd of s is sqrt((kurtosis - 1) / n) / 2 = 0.0011 (kurtosis 6).
        Assert.InRange(r.SigmaRatio, 0.99, 1.01);
    }

    [Fact]
    public void With_a_thousand_tail_samples_the_Laplace_inflation_matches_the_analytic_maximum()
    {
        // minTailCount = 1000 sets the reach (rho there 0.003 < 0.01). The tail count at the boundary edge
        // is 1000 + Poisson noise; +-4.5 sqrt(1000) = +-142 puts the boundary tail mass in [0.86e-3, 1.15e-3].
        // Expected: the maximum over the 1/64 edges within that reach of x / Phi^-1(F_L(x)), F_L the Laplace
        // CDF (MathNet), with the ratio noise 4.5 rho = 4.5 * 0.0032 on top.
        const double Rho = 0.0032; // sqrt(t / n) / (phi(q) q) at t = 0.86e-3, q = 3.13
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Laplace(8, N, 1.0 / Math.Sqrt(2.0)), minTailCount: 1000);
        double low = AnalyticMaximum(1.15e-3) * (1 - 4.5 * Rho);
        double high = AnalyticMaximum(0.86e-3) * (1 + 4.5 * Rho);
        Assert.InRange(r.RequiredInflation, low, high); // about [1.39, 1.46]
        Assert.InRange(r.TailProbabilityChecked, 0.86e-3, 1.15e-3);
    }

    [Fact]
    public void Too_few_samples_give_no_verdict()
    {
        // The smallest possible rho is 1.28 / sqrt(n) (at |q| = 1.57), above 0.01 for n = 1e4: nothing evaluated.
        OverboundResult r = OverboundAnalysis.RequiredInflation(OverboundSamples.Gaussian(9, 10_000));
        Assert.Equal(0, r.EvaluatedEdges);
        Assert.True(double.IsNaN(r.RequiredInflation));
        Assert.True(double.IsNaN(r.SamplingTolerance));
        Assert.False(r.Bounded);
        Assert.Equal(0, OverboundAnalysis.RequiredInflation(new OverboundHistogram()).EvaluatedEdges);
    }

    [Fact]
    public void The_verdict_of_a_merged_histogram_equals_that_of_the_union()
    {
        OverboundHistogram a = OverboundSamples.Gaussian(10, 200_000, sigma: 1.3);
        OverboundHistogram b = OverboundSamples.Gaussian(11, 300_000, sigma: 1.3);
        OverboundResult ab = OverboundAnalysis.RequiredInflation(Merged(a, b));
        OverboundResult ba = OverboundAnalysis.RequiredInflation(Merged(b, a));
        Assert.Equal(ab, ba); // integer counts and sums: merge order cannot change a bit
        Assert.Equal(500_000, ab.Samples);
    }

    private static OverboundHistogram Merged(OverboundHistogram first, OverboundHistogram second)
    {
        var h = new OverboundHistogram();
        h.Merge(first);
        h.Merge(second);
        return h;
    }

    /// <summary>k at tail mass t of the unit-variance Laplace: x = ln(2 t) / sqrt(2) over Phi^-1(t).</summary>
    private static double LaplaceK(double t) => Math.Log(2 * t) / Math.Sqrt(2.0) / Normal.InvCDF(0, 1, t);

    /// <summary>max over edges j / 64 with Laplace tail mass >= t of x / Phi^-1(F_L(x)), both sides.</summary>
    private static double AnalyticMaximum(double minTail)
    {
        var laplace = new Laplace(0.0, 1.0 / Math.Sqrt(2.0));
        double best = 0.0;
        for (int j = -768; j <= 768; j++)
        {
            double x = j / 64.0, f = laplace.CumulativeDistribution(x);
            if (j != 0 && Math.Min(f, 1 - f) >= minTail)
            {
                best = Math.Max(best, x / Normal.InvCDF(0, 1, f));
            }
        }

        return best;
    }
}

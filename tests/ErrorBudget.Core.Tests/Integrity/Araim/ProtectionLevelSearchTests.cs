using ErrorBudget.Core.Integrity.Araim;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>The half-interval search and the Gaussian tail it uses, on hand-made terms (derived cases).</summary>
public class ProtectionLevelSearchTests
{
    private const double Tolerance = 0.05;

    [Fact]
    public void Inverse_tail_matches_the_normal_quantile_and_inverts_the_tail()
    {
        foreach (double p in new[] { 1e-9, 4.9e-8, 1e-5, 0.01, 0.3 })
        {
            double x = GaussianTail.InverseQ(p);
            Assert.Equal(-Normal.InvCDF(0, 1, p), x, 1e-9 * Math.Max(1, x));
            Assert.Equal(p, GaussianTail.Q(x), 1e-9 * p);
        }

        Assert.True(double.IsNaN(GaussianTail.InverseQ(0.0)) && double.IsNaN(GaussianTail.InverseQ(1.0)));
    }

    [Fact]
    public void One_term_gives_the_closed_form_and_no_budget_gives_infinity()
    {
        // 2Q((PL − b)/σ) = t  ⇒  PL = b + σ·Q⁻¹(t/2): lower and upper bracket coincide.
        double pl = ProtectionLevelSearch.Solve([2.0], [1.5], [0.4], 1e-7, Tolerance);
        Assert.Equal(0.4 + (1.5 * -Normal.InvCDF(0, 1, 5e-8)), pl, 1e-12);
        Assert.Equal(double.PositiveInfinity, ProtectionLevelSearch.Solve([2.0], [1.5], [0.4], 0.0, Tolerance));
        Assert.Equal(double.PositiveInfinity, ProtectionLevelSearch.Solve([2.0], [1.5], [0.4], -1e-7, Tolerance));
    }

    [Fact]
    public void Several_terms_give_a_level_within_the_tolerance_above_the_root()
    {
        double[] prior = [2.0, 1e-5, 1e-5, 1e-4];
        double[] sigma = [1.2, 1.6, 2.4, 3.0];
        double[] offset = [0.5, 6.0, 9.0, 4.0];
        const double target = 9.8e-8;
        double pl = ProtectionLevelSearch.Solve(prior, sigma, offset, target, Tolerance);

        // The risk falls with PL: it is at most the target at PL and above it one tolerance lower.
        Assert.True(ProtectionLevelSearch.Risk(prior, sigma, offset, pl) <= target);
        Assert.True(ProtectionLevelSearch.Risk(prior, sigma, offset, pl - Tolerance) > target);

        // Zero-prior terms are ignored.
        Assert.Equal(pl, ProtectionLevelSearch.Solve([.. prior, 0.0], [.. sigma, 1.0], [.. offset, 100.0], target, Tolerance));
    }
}

using ErrorBudget.Core.Exact;
using ErrorBudget.Core.Random;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Exact;

public class GaussianPositionErrorTests
{
    [Theory]
    [InlineData(0.3)]
    [InlineData(1.0)]
    [InlineData(2.5)]
    public void Equal_eigenvalues_give_the_Rayleigh_distribution(double r)
    {
        // P(R <= r) = 1 - exp(-r^2 / (2 sigma^2)) for a circular Gaussian (Rayleigh; common practice).
        double expected = 1 - Math.Exp(-r * r / (2 * 1.7));
        Assert.Equal(expected, GaussianPositionError.HorizontalCdf(r, 1.7, 1.7, 8), 13);
    }

    [Theory]
    [InlineData(1.0, 0.6)]
    [InlineData(4.0, 0.5)]
    [InlineData(30.0, 1.0)]
    [InlineData(200.0, 0.7)]
    [InlineData(1000.0, 1.0)]
    [InlineData(1e6, 1.0)]
    [InlineData(1e8, 1.0)]
    public void The_chosen_node_count_matches_a_fine_reference(double lambda1, double lambda2)
    {
        int nodes = GaussianPositionError.NodesFor(lambda1, lambda2);
        // Up to far beyond the long axis too: the exact path's brackets reach the largest component's
        // quantile, tens of thousands of sigma1 of the smallest (a form that lost its nodes there once
        // returned 2e-78 for a probability of 1).
        foreach (double scale in new[] { 1e-4, 1e-3, 0.01, 0.1, 0.5, 1, 2, 4, 9.99, 10.01, 30, 1e3, 1e5 })
        {
            double r = scale * Math.Sqrt(lambda1);
            // The angular form with 2^20 midpoints resolves even the narrowest band here (width r / sqrt(lambda1) >= 1e-4).
            double reference = GaussianPositionError.HorizontalCdf(r, lambda1, lambda2, 1 << 20);
            // The elongated form leaves unresolved the band within about 2 sigma2 / r of t = pi/2, whose
            // mass is below phi(0) (2 sigma2)^2 / (sigma1 r) ~ 1e-7 at worst here: a looser bound there.
            double tolerance = nodes == GaussianPositionError.LineNodes ? 1e-7 : 1e-9;
            Assert.True(Math.Abs(GaussianPositionError.HorizontalCdf(r, lambda1, lambda2, nodes) - reference) <= tolerance, $"r {r}: {nodes} nodes");
        }
    }

    [Fact]
    public void The_horizontal_cdf_matches_sampled_elliptical_gaussians()
    {
        // 4e5 samples of (sqrt(l1) z1, sqrt(l2) z2): the empirical CDF at each r is within 4.5 binomial
        // standard deviations sqrt(F (1 - F) / n) of the formula.
        const int N = 400_000;
        double l1 = 3.0, l2 = 0.4;
        var z = new double[2 * N];
        CounterRng.FillNormals(CounterRng.Key(12, RandomPurpose.Spare, 1, 2, 3), 0, z);
        foreach (double r in new[] { 0.5, 1.0, 2.0, 3.5, 5.0 })
        {
            long inside = 0;
            for (int i = 0; i < N; i++)
            {
                double e = Math.Sqrt(l1) * z[2 * i], n = Math.Sqrt(l2) * z[(2 * i) + 1];
                inside += (e * e) + (n * n) <= r * r ? 1 : 0;
            }

            double f = GaussianPositionError.HorizontalCdf(r, l1, l2, GaussianPositionError.NodesFor(l1, l2));
            double sd = Math.Sqrt(f * (1 - f) / N);
            Assert.True(Math.Abs(((double)inside / N) - f) <= (4.5 * sd) + 1e-12, $"r {r}: {(double)inside / N} vs {f}");
        }
    }

    [Theory]
    [InlineData(4.0, 0.02)]
    [InlineData(4.0, 1e-9)]
    [InlineData(1e4, 0.3)]
    public void The_elongated_form_is_continuous_where_it_changes_variable(double lambda1, double lambda2)
    {
        // At r = 10 sigma1 the integral switches from x = r sin t to x itself: both sides must agree with
        // the one function, to the rule's accuracy (1e-9 of probability here).
        int nodes = GaussianPositionError.NodesFor(lambda1, lambda2);
        Assert.Equal(GaussianPositionError.LineNodes, nodes);
        double edge = 10 * Math.Sqrt(lambda1);
        double below = GaussianPositionError.HorizontalCdf(edge * (1 - 1e-12), lambda1, lambda2, nodes);
        double above = GaussianPositionError.HorizontalCdf(edge * (1 + 1e-12), lambda1, lambda2, nodes);
        Assert.True(Math.Abs(above - below) <= 1e-9, $"{below:R} vs {above:R}");
        Assert.Equal(1.0, GaussianPositionError.HorizontalCdf(35_000 * Math.Sqrt(lambda1), lambda1, lambda2, nodes), 12);
    }

    [Fact]
    public void The_cdf_allocates_nothing()
    {
        // The exact path calls it for every component at every root-finding step (hundreds of millions of
        // times on a large grid); MathNet's quadrature rule hands out a copy of its node arrays on every
        // access, which once made each call of the elongated form allocate 68 KB.
        foreach (var (l1, l2) in new[] { (1.0, 0.9), (30.0, 1.0), (1e6, 1.0) })
        {
            int nodes = GaussianPositionError.NodesFor(l1, l2);
            foreach (double r in new[] { 0.5 * Math.Sqrt(l1), 50 * Math.Sqrt(l1) })
            {
                GaussianPositionError.HorizontalCdf(r, l1, l2, nodes); // first call: static tables
                long before = GC.GetAllocatedBytesForCurrentThread();
                double sum = 0;
                for (int i = 0; i < 100; i++)
                {
                    sum += GaussianPositionError.HorizontalCdf(r, l1, l2, nodes);
                }

                Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
                Assert.InRange(sum, 0, 100);
            }
        }
    }

    [Fact]
    public void A_degenerate_ellipse_is_the_half_normal_of_its_long_axis()
    {
        // lambda2 -> 0: the horizontal error lies on a line, |E| half-normal with sigma sqrt(lambda1).
        double sigma = Math.Sqrt(9.0);
        foreach (double r in new[] { 0.5, 3.0, 6.0 })
        {
            Assert.Equal(GaussianPositionError.VerticalCdf(r, sigma), GaussianPositionError.HorizontalCdf(r, 9.0, 1e-12, GaussianPositionError.NodesFor(9.0, 1e-12)), 9);
        }
    }

    [Fact]
    public void The_vertical_cdf_is_the_half_normal()
    {
        // P(|U| <= 1.96 sigma) = 0.95 (standard normal table; MathNet Normal.CDF).
        Assert.Equal(2 * Normal.CDF(0, 1, 1.96) - 1, GaussianPositionError.VerticalCdf(1.96 * 2.5, 2.5), 12);
    }

    [Fact]
    public void Eigenvalues_of_a_two_by_two_covariance_are_its_principal_variances()
    {
        var (l1, l2) = GaussianPositionError.Eigenvalues(2.0, 1.0, 2.0); // [[2,1],[1,2]]: eigenvalues 3 and 1
        Assert.Equal(3.0, l1, 12);
        Assert.Equal(1.0, l2, 12);
    }
}

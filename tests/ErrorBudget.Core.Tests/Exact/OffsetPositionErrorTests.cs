using ErrorBudget.Core.Exact;
using ErrorBudget.Core.Random;
using MathNet.Numerics;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Exact;

/// <summary>The position-error distributions with a known mean (a deterministic bias through S).</summary>
public class OffsetPositionErrorTests
{
    [Theory]
    [InlineData(0.5, 1.0, 0.3)]
    [InlineData(2.0, 1.0, 1.5)]
    [InlineData(7.0, 2.0, 5.0)]
    [InlineData(0.2, 0.1, 40.0)]
    [InlineData(45.0, 2.0, 40.0)]
    public void The_vertical_cdf_is_the_folded_normal(double x, double sigma, double mu)
    {
        // Phi((x - mu) / sigma) - Phi((-x - mu) / sigma), with MathNet's normal CDF (common practice).
        var normal = new Normal(mu, sigma);
        double expected = normal.CumulativeDistribution(x) - normal.CumulativeDistribution(-x);
        Assert.Equal(expected, GaussianPositionError.VerticalCdf(x, sigma, mu), 1e-14);
        Assert.Equal(GaussianPositionError.VerticalCdf(x, sigma, mu), GaussianPositionError.VerticalCdf(x, sigma, -mu));
    }

    [Fact]
    public void A_zero_mean_takes_the_zero_mean_forms_bit_for_bit()
    {
        Assert.Equal(GaussianPositionError.VerticalCdf(1.3, 0.8), GaussianPositionError.VerticalCdf(1.3, 0.8, 0.0));
        int nodes = GaussianPositionError.NodesFor(5.0, 0.02);
        Assert.Equal(GaussianPositionError.HorizontalCdf(0.9, 5.0, 0.02, nodes), GaussianPositionError.HorizontalCdf(0.9, 5.0, 0.02, 0.0, 0.0, nodes));
    }

    [Theory]
    [InlineData(1.0, 0.0)]
    [InlineData(1.0, 1.0)]
    [InlineData(1.0, 3.0)]
    [InlineData(2.0, 10.0)]
    public void A_circular_error_with_an_offset_follows_the_Rice_distribution(double sigma, double offset)
    {
        // Rice (1945): density (x / s^2) exp(-(x^2 + v^2) / (2 s^2)) I0(x v / s^2) (common practice),
        // integrated here with MathNet's Bessel function and adaptive Gauss-Kronrod, independently of the
        // form under test. The offset is split between the axes so both means take part.
        double v = offset, s2 = sigma * sigma;
        foreach (double scale in new[] { 0.3, 1.0, 2.0, 3.0, 5.0 })
        {
            double r = (scale * sigma) + (0.8 * v);
            double expected = Integrate.GaussKronrod(
                x => x / s2 * Math.Exp(-((x * x) + (v * v)) / (2 * s2)) * SpecialFunctions.BesselI0(x * v / s2), 0, r, 1e-14, 20, order: 61);
            double actual = GaussianPositionError.HorizontalCdf(r, s2, s2, 0.6 * v, 0.8 * v, 8);
            Assert.True(Math.Abs(actual - expected) < 1e-9, $"r {r}: {actual} vs {expected}");
        }
    }

    [Theory]
    [InlineData(9.0, 1.0, 30.0, 0.0)]
    [InlineData(9.0, 1.0, 0.0, 30.0)]
    [InlineData(16.0, 0.25, 20.0, 15.0)]
    [InlineData(100.0, 1.0, 5.0, 40.0)]
    [InlineData(4.0, 4.0, 10.0, 10.0)]
    [InlineData(1e4, 0.01, 300.0, 2.0)]
    // Means across the short axis far beyond the spread: the short-axis window meets the disc's edge,
    // where the chord (and so G) changes fastest; the panels follow G's scale there.
    [InlineData(4.0, 4.0, 0.0, 200.0)]
    [InlineData(1.0, 1.0, 0.5, 1000.0)]
    [InlineData(100.0, 25.0, 0.0, 500.0)]
    public void An_offset_ellipse_matches_the_other_conditioning(double lambda1, double lambda2, double m1, double m2)
    {
        // The reference conditions on the long axis instead (x ~ N(m1, lambda1), the chord across it
        // sqrt(r^2 - x^2), P(|y| <= chord) from MathNet's normal CDF) and integrates with MathNet's
        // adaptive Gauss-Kronrod: another order, another rule, another erf. Radii around the mean's
        // distance, where the quantiles of such a component lie.
        double s1 = Math.Sqrt(lambda1), s2 = Math.Sqrt(lambda2), distance = Math.Sqrt((m1 * m1) + (m2 * m2));
        var across = new Normal(m2, s2);
        foreach (double k in new[] { -3.0, -1.0, 0.0, 1.0, 3.0, 6.0 })
        {
            double r = distance + (k * s1);
            if (r <= 0)
            {
                continue;
            }

            double lo = Math.Max(-r, m1 - (12 * s1)), hi = Math.Min(r, m1 + (12 * s1));
            double expected = lo >= hi ? 0.0 : Integrate.GaussKronrod(
                x =>
                {
                    double chord = Math.Sqrt(Math.Max(0.0, (r * r) - (x * x)));
                    return Math.Exp(-0.5 * Math.Pow((x - m1) / s1, 2)) / (s1 * Math.Sqrt(2 * Math.PI))
                        * (across.CumulativeDistribution(chord) - across.CumulativeDistribution(-chord));
                },
                lo, hi, 1e-13, 25, order: 61);
            double actual = GaussianPositionError.HorizontalCdf(r, lambda1, lambda2, m1, m2, GaussianPositionError.NodesFor(lambda1, lambda2));
            Assert.True(Math.Abs(actual - expected) < 1e-9, $"r {r}: {actual} vs {expected}");
        }
    }

    [Theory]
    [InlineData(30.0)]
    [InlineData(300.0)]
    public void A_line_with_an_offset_across_it_is_the_folded_normal_of_the_chord(double r)
    {
        // lambda2 -> 0: every error lies on the line y = m2, so P = P(|x| <= sqrt(r^2 - m2^2)) (derived).
        double lambda1 = 25.0, m1 = 4.0, m2 = 0.6 * r;
        double chord = Math.Sqrt((r * r) - (m2 * m2));
        double expected = GaussianPositionError.VerticalCdf(chord, 5.0, m1);
        double actual = GaussianPositionError.HorizontalCdf(r, lambda1, 1e-10, m1, m2, GaussianPositionError.LineNodes);
        Assert.Equal(expected, actual, 1e-9);
    }

    [Theory]
    [InlineData(4.0, 0.4, 1.0, 2.0)]
    [InlineData(2500.0, 0.25, 30.0, 3.0)]
    [InlineData(1.0, 0.9, 0.0, 4.0)]
    public void The_horizontal_cdf_with_a_mean_matches_sampled_errors(double lambda1, double lambda2, double m1, double m2)
    {
        // 4e5 samples of (m1 + sqrt(l1) z1, m2 + sqrt(l2) z2): the empirical CDF at each radius is within
        // 4.5 binomial standard deviations sqrt(F (1 - F) / n) of the formula.
        const int N = 400_000;
        var z = new double[2 * N];
        CounterRng.FillNormals(CounterRng.Key(13, RandomPurpose.Spare, 4, 5, 6), 0, z);
        double spread = Math.Sqrt(lambda1) + Math.Sqrt(lambda2) + Math.Sqrt((m1 * m1) + (m2 * m2));
        foreach (double fraction in new[] { 0.1, 0.3, 0.6, 1.0, 1.5 })
        {
            double r = fraction * spread;
            long inside = 0;
            for (int i = 0; i < N; i++)
            {
                double x = m1 + (Math.Sqrt(lambda1) * z[2 * i]), y = m2 + (Math.Sqrt(lambda2) * z[(2 * i) + 1]);
                inside += (x * x) + (y * y) <= r * r ? 1 : 0;
            }

            double f = GaussianPositionError.HorizontalCdf(r, lambda1, lambda2, m1, m2, GaussianPositionError.NodesFor(lambda1, lambda2));
            double sd = Math.Sqrt(f * (1 - f) / N);
            Assert.True(Math.Abs(((double)inside / N) - f) <= (4.5 * sd) + 1e-12, $"r {r}: {(double)inside / N} vs {f}");
        }
    }

    [Theory]
    [InlineData(1.0, 1.0)]
    [InlineData(20.0, 1.0)]
    [InlineData(1e4, 1.0)]
    [InlineData(1e6, 1.0)]
    public void A_vanishing_mean_joins_the_zero_mean_forms(double lambda1, double lambda2)
    {
        // The offset form is an independent quadrature (short-axis conditioning): with a mean of 2e-5
        // sigma2 (above the 1e-6 below which it hands over to the zero-mean forms; the CDF is even in the
        // mean, so this one moves it by ~4e-10) it must give the zero-mean forms' values to their
        // accuracy (1e-9; 1e-7 elongated).
        int nodes = GaussianPositionError.NodesFor(lambda1, lambda2);
        double tolerance = nodes == GaussianPositionError.LineNodes ? 2e-7 : 2e-9;
        foreach (double scale in new[] { 0.01, 0.3, 1.0, 2.5, 5.0, 50.0 })
        {
            double r = scale * Math.Sqrt(lambda1);
            double zero = GaussianPositionError.HorizontalCdf(r, lambda1, lambda2, nodes);
            double tiny = GaussianPositionError.HorizontalCdf(r, lambda1, lambda2, 2e-5 * Math.Sqrt(lambda2), 0.0, nodes);
            Assert.True(Math.Abs(zero - tiny) < tolerance, $"r {r}: {tiny} vs {zero}");
        }
    }

    [Fact]
    public void The_vector_and_scalar_offset_forms_agree()
    {
        // Four nodes per Vector256 (exp and the gathered erf table) against one at a time: the same sum
        // up to the vector exp's rounding.
        Assert.True(GaussianPositionError.VectorOffsetForm, "this machine has AVX2 (REFERENCE.md)");
        var cases = new (double L1, double L2, double M1, double M2)[] { (9, 2, 25, 15), (16, 1, 5, 30), (4, 3, 30, 1), (1e4, 0.01, 300, 2), (4, 4, 0, 200) };
        foreach (var (l1, l2, m1, m2) in cases)
        {
            double d = Math.Sqrt((m1 * m1) + (m2 * m2));
            foreach (double k in new[] { -2.0, -0.5, 0.0, 0.7, 2.0 })
            {
                double r = d + (k * Math.Sqrt(l1));
                double vector = GaussianPositionError.HorizontalCdf(r, l1, l2, m1, m2, 16, vector: true);
                double scalar = GaussianPositionError.HorizontalCdf(r, l1, l2, m1, m2, 16, vector: false);
                Assert.True(Math.Abs(vector - scalar) < 1e-14, $"r {r}: {vector} vs {scalar}");
                Assert.True(vector > 0 && vector < 1, $"r {r}: {vector} should be inside (0, 1) here");
            }
        }
    }

    [Fact]
    public void Far_from_the_mean_the_answer_is_zero_or_one()
    {
        // 10 sigma1 either side of the mean's distance: exactly 0 and 1 (the mass left out is below 2e-22).
        Assert.Equal(0.0, GaussianPositionError.HorizontalCdf(50.0 - 30.01, 9.0, 1.0, 30.0, 40.0, 16));
        Assert.Equal(1.0, GaussianPositionError.HorizontalCdf(50.0 + 30.01, 9.0, 1.0, 30.0, 40.0, 16));
        // Just inside, the quadrature's own value: within 1e-15 of the same limits.
        Assert.True(GaussianPositionError.HorizontalCdf(50.0 - 29.0, 9.0, 1.0, 30.0, 40.0, 16) < 1e-15);
        Assert.True(GaussianPositionError.HorizontalCdf(50.0 + 29.0, 9.0, 1.0, 30.0, 40.0, 16) > 1 - 1e-15);
    }

    [Fact]
    public void A_mean_below_a_millionth_of_sigma_is_taken_as_zero()
    {
        int nodes = GaussianPositionError.NodesFor(4.0, 1.0);
        Assert.Equal(GaussianPositionError.HorizontalCdf(2.0, 4.0, 1.0, nodes), GaussianPositionError.HorizontalCdf(2.0, 4.0, 1.0, 1e-7, 5e-7, nodes));
        Assert.NotEqual(GaussianPositionError.HorizontalCdf(2.0, 4.0, 1.0, nodes), GaussianPositionError.HorizontalCdf(2.0, 4.0, 1.0, 1e-3, 0.0, nodes));
        Assert.Equal(GaussianPositionError.VerticalCdf(2.0, 1.5), GaussianPositionError.VerticalCdf(2.0, 1.5, 1e-6));
    }

    [Fact]
    public void A_mean_far_beyond_the_spread_moves_the_distribution_with_it()
    {
        // A 10 km bias (a missed frequency offset after a day) on metre-level noise: the HPE is about the
        // bias, so P(HPE <= bias -+ 5 sigma) is about 0 and 1, and the median is near the bias.
        double bias = 10_000.0;
        var (along, across) = (0.8 * bias, 0.6 * bias);
        Assert.True(GaussianPositionError.HorizontalCdf(bias - 25, 9.0, 1.0, along, across, 16) < 1e-6);
        Assert.True(GaussianPositionError.HorizontalCdf(bias + 25, 9.0, 1.0, along, across, 16) > 1 - 1e-6);
        double median = GaussianPositionError.HorizontalCdf(bias, 9.0, 1.0, along, across, 16);
        Assert.InRange(median, 0.45, 0.55);
    }

    [Fact]
    public void The_mean_is_resolved_along_the_covariance_axes()
    {
        // A covariance elongated along the north-east diagonal: a mean along that diagonal is all "along".
        var (along, across) = GaussianPositionError.MeanInEigenFrame(2.0, 1.5, 2.0, 3.0, 3.0);
        Assert.Equal(3.0 * Math.Sqrt(2.0), along, 12);
        Assert.Equal(0.0, across, 12);
        // East-elongated: east is the long axis, north the short one.
        var (a2, c2) = GaussianPositionError.MeanInEigenFrame(5.0, 0.0, 1.0, 1.0, 2.0);
        Assert.Equal(1.0, a2, 14);
        Assert.Equal(2.0, c2, 14);
    }
}

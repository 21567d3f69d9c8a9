using ErrorBudget.Core.Random;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Random;

public class CounterRngUniformTests
{
    private const int N = 1_000_000;

    [Fact]
    public void Extreme_bit_patterns_stay_strictly_inside_the_unit_interval()
    {
        // Derived from the mapping (m + 1/2) 2^-52: the extremes are 2^-53 and 1 - 2^-53, exactly.
        Assert.Equal(Math.Pow(2, -53), CounterRng.UniformFromBits(0));
        Assert.Equal(1 - Math.Pow(2, -53), CounterRng.UniformFromBits(ulong.MaxValue));
        Assert.True(CounterRng.UniformFromBits(ulong.MaxValue) < 1.0);
        Assert.Equal(0.5 + Math.Pow(2, -53), CounterRng.UniformFromBits(1UL << 63)); // m = 2^51
    }

    [Fact]
    public void Uniforms_are_never_zero_or_one()
    {
        ulong key = CounterRng.Key(21, RandomPurpose.Fault, 0, 0, 0);
        for (ulong i = 0; i < N; i++)
        {
            double u = CounterRng.Uniform(key, i);
            Assert.True(u > 0.0 && u < 1.0);
        }
    }

    [Fact]
    public void Hundred_bins_pass_a_chi_square_goodness_of_fit_test()
    {
        // Equal bins of width 1/100, expected n / 100 each; Pearson's statistic ~ chi-square(99);
        // reject only above its 1 - 1e-4 quantile (common practice).
        const int Bins = 100;
        ulong key = CounterRng.Key(22, RandomPurpose.Fault, 0, 0, 0);
        var observed = new long[Bins];
        for (ulong i = 0; i < N; i++)
        {
            observed[(int)(CounterRng.Uniform(key, i) * Bins)]++;
        }

        double expected = (double)N / Bins;
        double statistic = observed.Sum(o => (o - expected) * (o - expected) / expected);
        Assert.True(statistic < ChiSquared.InvCDF(Bins - 1, 1 - 1e-4), $"chi-square {statistic:F1}");
    }

    [Fact]
    public void Successive_uniforms_are_uncorrelated()
    {
        // Lag-1 serial correlation of n independent values has sd ~ 1 / sqrt(n); band 4.5 sd.
        ulong key = CounterRng.Key(23, RandomPurpose.Relativity, 1, 1, 1);
        var u = new double[N + 1];
        for (int i = 0; i < u.Length; i++)
        {
            u[i] = CounterRng.Uniform(key, (ulong)i);
        }

        double r = SampleStatistics.Correlation(u.AsSpan(0, N), u.AsSpan(1, N));
        Assert.True(Math.Abs(r) < 4.5 / Math.Sqrt(N), $"r = {r:R}");
    }
}

using System.Runtime.Intrinsics;
using ErrorBudget.Core.Random;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Random;

public class SingleNormalsTests
{
    private const int N = 1_000_000;

    // Two-sided false-alarm rate of every statistical bound below: a 4.5-sigma band, 2 Phi(-4.5) = 6.8e-6.
    private static readonly double TailPerSide = Normal.CDF(0, 1, -4.5);

    private static double[] Draws(ulong seed, long firstTrial = 0, int n = N)
    {
        var x = new float[n];
        SingleNormals.Fill(CounterRng.Key(seed, RandomPurpose.UserLocal, 1, 2, 3), firstTrial, x);
        return [.. x.Select(v => (double)v)];
    }

    [Theory]
    [InlineData(0, 104)]
    [InlineData(0, 3)]
    [InlineData(5, 100)]
    [InlineData(16, 8)]
    [InlineData(2040, 2048)]
    [InlineData(7, 1)]
    public void The_vector_fill_gives_the_bits_of_the_scalar_form_for_any_start_and_length(long firstTrial, int length)
    {
        ulong key = CounterRng.Key(3, RandomPurpose.UserLocal, 4, 5, 6);
        var filled = new float[length];
        SingleNormals.Fill(key, firstTrial, filled);
        for (int i = 0; i < length; i++)
        {
            Assert.Equal(BitConverter.SingleToInt32Bits(SingleNormals.OfTrial(key, firstTrial + i)), BitConverter.SingleToInt32Bits(filled[i]));
        }
    }

    [Theory]
    [InlineData(0, 112)]
    [InlineData(0, 104)]
    [InlineData(16, 31)]
    [InlineData(3, 70)]
    [InlineData(2032, 2064)]
    [InlineData(48, 8)]
    public void Every_vector_width_writes_the_same_bits(long firstTrial, int length)
    {
        Assert.True(Vector512.IsHardwareAccelerated, "this machine accelerates Vector512 (REFERENCE.md)");
        ulong key = CounterRng.Key(8, RandomPurpose.UserLocal, 1, 7, 2);
        var scalar = new float[length];
        SingleNormals.Fill(key, firstTrial, scalar, 0);
        foreach (int bits in new[] { 256, 512 })
        {
            var filled = new float[length];
            SingleNormals.Fill(key, firstTrial, filled, bits);
            for (int i = 0; i < length; i++)
            {
                Assert.Equal(BitConverter.SingleToInt32Bits(scalar[i]), BitConverter.SingleToInt32Bits(filled[i]));
            }
        }
    }

    [Fact]
    public void Mean_and_variance_are_those_of_a_standard_normal()
    {
        // Mean: sd 1 / sqrt(n). Variance: (n - 1) s^2 ~ chi-square(n - 1), accepted between its
        // TailPerSide and 1 - TailPerSide quantiles (about 1 +- 0.0064 for n = 1e6).
        double[] x = Draws(21);
        Assert.InRange(SampleStatistics.Mean(x), -4.5 / Math.Sqrt(N), 4.5 / Math.Sqrt(N));
        Assert.InRange(SampleStatistics.Variance(x), ChiSquared.InvCDF(N - 1, TailPerSide) / (N - 1), ChiSquared.InvCDF(N - 1, 1 - TailPerSide) / (N - 1));
    }

    [Fact]
    public void Twenty_equiprobable_bins_pass_a_chi_square_goodness_of_fit_test()
    {
        // Bins bounded by the normal quantiles k / 20 (equal expected counts n / 20, common practice);
        // Pearson's statistic ~ chi-square(19), rejected only above its 1 - 1e-4 quantile.
        const int Bins = 20;
        double[] edges = [.. Enumerable.Range(1, Bins - 1).Select(k => Normal.InvCDF(0, 1, (double)k / Bins))];
        var observed = new long[Bins];
        foreach (double x in Draws(22))
        {
            int bin = Array.BinarySearch(edges, x);
            observed[bin >= 0 ? bin : ~bin]++;
        }

        double expected = (double)N / Bins;
        double statistic = observed.Sum(o => (o - expected) * (o - expected) / expected);
        Assert.True(statistic < ChiSquared.InvCDF(Bins - 1, 1 - 1e-4), $"chi-square {statistic:F1}");
    }

    [Fact]
    public void Tail_masses_beyond_three_and_four_sigma_match_the_normal_cdf_and_nothing_passes_the_cut()
    {
        // Binomial counts; band 4.5 sd of Binomial(n, p). n = 1e7 gives 633 expected beyond 4 sigma.
        // The radius uniform's smallest value 2^-41 cuts |z| at sqrt(82 ln 2) = 7.54.
        double[] x = Draws(23, 0, 10_000_000);
        double cut = Math.Sqrt(82 * Math.Log(2));
        foreach (double sigma in new[] { 3.0, 4.0 })
        {
            double p = 2 * Normal.CDF(0, 1, -sigma);
            long count = x.LongCount(v => Math.Abs(v) > sigma);
            double expected = p * x.Length;
            double band = 4.5 * Math.Sqrt(x.Length * p * (1 - p));
            Assert.InRange(count, expected - band, expected + band);
        }

        Assert.True(x.Max(Math.Abs) <= cut, $"largest |z| {x.Max(Math.Abs)} above the cut {cut}");
    }

    [Fact]
    public void The_cosine_and_sine_halves_of_a_pair_are_uncorrelated()
    {
        // Trials 16 g + l and 16 g + 8 + l share a Box-Muller pair: uncorrelated by construction. The
        // sample correlation of n pairs has sd ~ 1 / sqrt(n); accept 4.5 sd.
        double[] x = Draws(24);
        var cosines = new List<double>();
        var sines = new List<double>();
        for (int g = 0; g + 16 <= x.Length; g += 16)
        {
            for (int l = 0; l < 8; l++)
            {
                cosines.Add(x[g + l]);
                sines.Add(x[g + 8 + l]);
            }
        }

        double bound = 4.5 / Math.Sqrt(cosines.Count);
        Assert.InRange(SampleStatistics.Correlation(cosines.ToArray(), sines.ToArray()), -bound, bound);
        Assert.InRange(SampleStatistics.Correlation(x.AsSpan(0, N - 1), x.AsSpan(1, N - 1)), -4.5 / Math.Sqrt(N), 4.5 / Math.Sqrt(N));
    }
}

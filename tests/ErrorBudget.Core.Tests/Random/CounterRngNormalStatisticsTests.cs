using ErrorBudget.Core.Random;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Random;

public class CounterRngNormalStatisticsTests
{
    private const int N = 1_000_000;

    // Two-sided tail mass of a 4.5-sigma band, 2 * Phi(-4.5) = 6.8e-6: the false-alarm rate used for
    // every statistical bound below (derived from the normal CDF).
    private static readonly double TailPerSide = Normal.CDF(0, 1, -4.5);

    private static double[] Draws(ulong seed)
    {
        var x = new double[N];
        CounterRng.FillNormals(CounterRng.Key(seed, RandomPurpose.SatelliteOrbit, 1, 2, 3), 0, x);
        return x;
    }

    [Fact]
    public void Mean_is_zero_within_four_and_a_half_standard_errors()
    {
        // The mean of n standard normals has sd 1 / sqrt(n).
        double mean = SampleStatistics.Mean(Draws(11));
        Assert.InRange(mean, -4.5 / Math.Sqrt(N), 4.5 / Math.Sqrt(N));
    }

    [Fact]
    public void Variance_is_one_within_the_chi_square_band()
    {
        // (n - 1) s^2 / sigma^2 ~ chi-square(n - 1): accept s^2 between the TailPerSide and
        // 1 - TailPerSide quantiles divided by n - 1 (about 1 +- 0.0064 for n = 1e6).
        double variance = SampleStatistics.Variance(Draws(12));
        double lower = ChiSquared.InvCDF(N - 1, TailPerSide) / (N - 1);
        double upper = ChiSquared.InvCDF(N - 1, 1 - TailPerSide) / (N - 1);
        Assert.InRange(variance, lower, upper);
    }

    [Fact]
    public void Twenty_equiprobable_bins_pass_a_chi_square_goodness_of_fit_test()
    {
        // Bins bounded by the normal quantiles k / 20 (common practice: equal expected counts n / 20).
        // Pearson's statistic ~ chi-square(19) under H0; reject only above its 1 - 1e-4 quantile.
        const int Bins = 20;
        var edges = new double[Bins - 1];
        for (int k = 1; k < Bins; k++)
        {
            edges[k - 1] = Normal.InvCDF(0, 1, (double)k / Bins);
        }

        var observed = new long[Bins];
        foreach (double x in Draws(13))
        {
            int bin = Array.BinarySearch(edges, x);
            observed[bin >= 0 ? bin : ~bin]++;
        }

        double expected = (double)N / Bins;
        double statistic = observed.Sum(o => (o - expected) * (o - expected) / expected);
        double critical = ChiSquared.InvCDF(Bins - 1, 1 - 1e-4);
        Assert.True(statistic < critical, $"chi-square {statistic:F1} >= critical {critical:F1}");
    }

    [Fact]
    public void Tail_masses_beyond_three_and_four_sigma_match_the_normal_cdf()
    {
        // Tails test the Box-Muller radius and the resolution of u1. Counts are binomial; the band is
        // 4.5 sd of Binomial(n, p) ~ 4.5 sqrt(n p). n = 1e7 gives 633 expected beyond 4 sigma.
        const int Total = 10_000_000;
        const int Chunk = 100_000;
        ulong key = CounterRng.Key(14, RandomPurpose.UserLocal, 0, 0, 0);
        var buffer = new double[Chunk];
        long beyond3 = 0, beyond4 = 0;
        for (int start = 0; start < Total; start += Chunk)
        {
            CounterRng.FillNormals(key, (ulong)start, buffer);
            foreach (double x in buffer)
            {
                double a = Math.Abs(x);
                beyond3 += a > 3 ? 1 : 0;
                beyond4 += a > 4 ? 1 : 0;
            }
        }

        foreach (var (threshold, observed) in new[] { (3.0, beyond3), (4.0, beyond4) })
        {
            double p = 2 * Normal.CDF(0, 1, -threshold);
            double expected = Total * p;
            double band = 4.5 * Math.Sqrt(Total * p * (1 - p));
            Assert.InRange(observed, expected - band, expected + band);
        }
    }

    [Fact]
    public void Adjacent_trials_give_uncorrelated_normals()
    {
        // Keys of trial t and t + 1 (and the same for the other words): pooled correlation of
        // index-matched normals over n = 1000 key pairs x 1000 draws = 1e6 products; under
        // independence r has sd 1 / sqrt(n), the band is 4.5 sd.
        const int Pairs = 1000;
        const int Draws = 1000;
        var x = new double[Draws];
        var y = new double[Draws];
        for (int word = 0; word < 4; word++)
        {
            double sxy = 0, sxx = 0, syy = 0;
            for (long t = 0; t < Pairs; t++)
            {
                CounterRng.FillNormals(KeyWithWord(word, t), 0, x);
                CounterRng.FillNormals(KeyWithWord(word, t + 1), 0, y);
                for (int i = 0; i < Draws; i++)
                {
                    sxy += x[i] * y[i];
                    sxx += x[i] * x[i];
                    syy += y[i] * y[i];
                }
            }

            double r = sxy / Math.Sqrt(sxx * syy);
            double band = 4.5 / Math.Sqrt((double)Pairs * Draws);
            Assert.True(Math.Abs(r) < band, $"word {word}: r = {r:R}, band {band:R}");
        }
    }

    private static ulong KeyWithWord(int word, long t) => word switch
    {
        0 => CounterRng.Key((ulong)t, RandomPurpose.SatelliteClock, 5, 6, 7),
        1 => CounterRng.Key(99, RandomPurpose.SatelliteClock, t, 6, 7),
        2 => CounterRng.Key(99, RandomPurpose.SatelliteClock, 5, t, 7),
        _ => CounterRng.Key(99, RandomPurpose.SatelliteClock, 5, 6, t),
    };
}

using ErrorBudget.Core.Random;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Statistics;

/// <summary>Seeded keys and weights for the compact/wide sketch tests, and the exact comparison of two sketches.</summary>
internal static class SketchFixtures
{
    private const ulong Seed = 20_250_601;

    /// <summary>Every quantile level the comparisons check: both ends, the reported percentiles, a fine grid.</summary>
    private static readonly double[] Levels =
        [.. Enumerable.Range(0, 101).Select(i => i / 100.0), 0.001, 0.999, 0.9999];

    /// <summary>
    /// n keys of lognormal magnitudes exp(1.5 z), z standard normal (|z| &lt;= 8.6 for CounterRng, so
    /// |key| &lt;= 1300 at alpha 0.005), about 8 % of them the zero key; stream picks an independent set.
    /// </summary>
    public static int[] Keys(int stream, int n, double scale = 1.0)
    {
        ulong zeroKey = CounterRng.Key(Seed, RandomPurpose.Spare, stream, 0, 0);
        ulong magnitudeKey = CounterRng.Key(Seed, RandomPurpose.Spare, stream, 1, 0);
        var mapping = new DDSketch(0.005);
        var keys = new int[n];
        for (int i = 0; i < n; i++)
        {
            keys[i] = CounterRng.Uniform(zeroKey, (ulong)i) < 0.08
                ? DDSketch.ZeroKey
                : mapping.KeyOf(scale * Math.Exp(1.5 * CounterRng.Normal(magnitudeKey, (ulong)i)));
        }

        return keys;
    }

    /// <summary>n weights uniform in 1..maxWeight.</summary>
    public static long[] Weights(int stream, int n, long maxWeight)
    {
        ulong key = CounterRng.Key(Seed, RandomPurpose.Spare, stream, 2, 0);
        var weights = new long[n];
        for (int i = 0; i < n; i++)
        {
            weights[i] = 1 + (long)(CounterRng.Bits(key, (ulong)i) % (ulong)maxWeight);
        }

        return weights;
    }

    /// <summary>
    /// Exact equality (counts are integers, so no tolerance): total, zero count, every bucket in a
    /// range wider than any key of <see cref="Keys"/> (scales up to 1e3), the quantiles and, unless
    /// told not to, the used range (a segment of AddKeysSegmented reserves the whole call's range).
    /// </summary>
    public static void AssertIdentical(DDSketch expected, DDSketch actual, bool sameUsedRange = true)
    {
        Assert.Equal(expected.Count, actual.Count);
        Assert.Equal(expected.ZeroCount, actual.ZeroCount);
        if (sameUsedRange)
        {
            Assert.Equal(expected.UsedBuckets, actual.UsedBuckets);
        }

        for (int key = -3000; key <= 3000; key++)
        {
            Assert.Equal(expected.CountOf(key), actual.CountOf(key));
        }

        foreach (double q in Levels)
        {
            Assert.Equal(expected.Quantile(q), actual.Quantile(q));
        }
    }
}

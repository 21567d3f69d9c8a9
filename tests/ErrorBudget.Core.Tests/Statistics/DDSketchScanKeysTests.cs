using ErrorBudget.Core.Random;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Statistics;

/// <summary>The vectorised key scan equals its scalar twin and a plain LINQ reference (exact integers).</summary>
public sealed class DDSketchScanKeysTests
{
    private static readonly int[] Widths = [0, 256, 512, DDSketch.ScanVectorBits];

    /// <summary>
    /// Random keys in [-2000, 2000] with zero keys at the given rate, and now and then an extreme key
    /// (int.MinValue + 1, int.MaxValue) that must not be mistaken for a zero or a sentinel.
    /// </summary>
    private static int[] RandomKeys(int length, double zeroRate, long stream)
    {
        ulong key = CounterRng.Key(7, RandomPurpose.Spare, length, stream, 0);
        var keys = new int[length];
        for (int i = 0; i < length; i++)
        {
            double u = CounterRng.Uniform(key, (ulong)(2 * i));
            double v = CounterRng.Uniform(key, (ulong)(2 * i) + 1);
            keys[i] = u < zeroRate ? DDSketch.ZeroKey
                : u > 0.995 ? (v < 0.5 ? int.MinValue + 1 : int.MaxValue)
                : (int)Math.Floor((4001 * v) - 2000);
        }

        return keys;
    }

    private static void AssertAllWidthsAgreeWithLinq(int[] keys)
    {
        int[] nonZero = [.. keys.Where(k => k != DDSketch.ZeroKey)];
        int expectedLo = nonZero.Length > 0 ? nonZero.Min() : int.MaxValue;
        int expectedHi = nonZero.Length > 0 ? nonZero.Max() : int.MinValue;
        long expectedZeros = keys.Length - nonZero.Length;
        foreach (int width in Widths)
        {
            DDSketch.ScanKeys(keys, width, out int lo, out int hi, out long zeros);
            Assert.True(
                (lo, hi, zeros) == (expectedLo, expectedHi, expectedZeros),
                $"width {width}, length {keys.Length}: got ({lo}, {hi}, {zeros}), expected ({expectedLo}, {expectedHi}, {expectedZeros})");
        }
    }

    [Fact]
    public void Every_width_gives_the_scalar_result_for_lengths_0_to_100()
    {
        // Lengths that are and are not multiples of 8 and 16, so both the vector part and the tail run.
        foreach (double zeroRate in new[] { 0.0, 0.2, 0.9 })
        {
            for (int length = 0; length <= 100; length++)
            {
                for (int stream = 0; stream < 3; stream++)
                {
                    AssertAllWidthsAgreeWithLinq(RandomKeys(length, zeroRate, (long)(zeroRate * 100) + stream));
                }
            }
        }
    }

    [Theory]
    [InlineData(0)]
    [InlineData(7)]
    [InlineData(16)]
    [InlineData(1001)]
    public void Spans_of_only_zero_keys_give_an_empty_range(int length)
    {
        int[] keys = [.. Enumerable.Repeat(DDSketch.ZeroKey, length)];
        AssertAllWidthsAgreeWithLinq(keys);
        DDSketch.ScanKeys(keys, out int lo, out int hi, out long zeros);
        Assert.True(lo > hi);
        Assert.Equal(length, zeros);
    }

    [Fact]
    public void A_long_span_of_hot_loop_keys_gives_the_scalar_result()
    {
        AssertAllWidthsAgreeWithLinq(SketchFixtures.Keys(90, 100_003));
    }
}

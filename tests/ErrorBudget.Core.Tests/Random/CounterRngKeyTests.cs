using System.Numerics;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Random;

public class CounterRngKeyTests
{
    [Fact]
    public void The_key_built_in_steps_is_the_key()
    {
        // The sampler caches the state after (seed, purpose, trial[, epoch]); that must not change any key.
        ulong word = CounterRng.Key(9, RandomPurpose.Spare, 0, 0, 0);
        for (int i = 0; i < 2000; i++)
        {
            ulong seed = CounterRng.Bits(word, (ulong)i);
            long a = (long)CounterRng.Bits(word, (ulong)(i + 5000)) >> (i % 60);
            long b = i - 1000;
            long c = (long)(CounterRng.Bits(word, (ulong)(i + 9000)) >> 40);
            var purpose = (RandomPurpose)((i % 7) + 1);
            ulong stepwise = CounterRng.KeyWithC(CounterRng.KeyWithB(CounterRng.KeyWithA(CounterRng.KeyStart(seed, purpose), a), b), c);
            Assert.Equal(CounterRng.Key(seed, purpose, a, b, c), stepwise);
        }
    }

    [Fact]
    public void Every_combination_of_small_words_gives_a_distinct_key()
    {
        // 4 seeds x 7 purposes x 12 x 12 x 12 = 48 384 keys of small, structured words (the usual
        // trial / epoch / satellite numbers). Random 64-bit keys collide with probability
        // ~ n^2 / 2^65 ~ 6e-11, so any collision means a broken construction.
        var keys = new HashSet<ulong>();
        int n = 0;
        foreach (ulong seed in new ulong[] { 0, 1, 2, ulong.MaxValue })
        {
            for (ulong purpose = 1; purpose <= 7; purpose++)
            {
                for (long a = -1; a < 11; a++)
                {
                    for (long b = -1; b < 11; b++)
                    {
                        for (long c = -1; c < 11; c++)
                        {
                            keys.Add(CounterRng.Key(seed, (RandomPurpose)purpose, a, b, c));
                            n++;
                        }
                    }
                }
            }
        }

        Assert.Equal(n, keys.Count);
    }

    [Fact]
    public void Swapping_two_words_changes_the_key()
    {
        for (long x = 0; x < 50; x++)
        {
            for (long y = x + 1; y < 50; y++)
            {
                Assert.NotEqual(CounterRng.Key(9, RandomPurpose.Fault, x, y, 0), CounterRng.Key(9, RandomPurpose.Fault, y, x, 0));
                Assert.NotEqual(CounterRng.Key(9, RandomPurpose.Fault, 0, x, y), CounterRng.Key(9, RandomPurpose.Fault, 0, y, x));
                Assert.NotEqual(CounterRng.Key((ulong)x, RandomPurpose.Fault, y, 0, 0), CounterRng.Key((ulong)y, RandomPurpose.Fault, x, 0, 0));
            }
        }
    }

    [Fact]
    public void One_flipped_input_bit_changes_half_the_key_bits()
    {
        // Avalanche: for an unrelated key the Hamming distance is Binomial(64, 1/2): mean 32, sd 4.
        // Over n = 5 words x 64 bits x 4 bases = 1280 flips the mean distance has sd 4 / sqrt(1280)
        // = 0.11; we allow 4.5 sd. Every single flip must change the key (distance >= 1).
        var bases = new (ulong Seed, long A, long B, long C)[] { (0, 0, 0, 0), (1, 2, 3, 4), (12345, -7, 1000, 31), (ulong.MaxValue, long.MaxValue, 0, -1) };
        long total = 0;
        int flips = 0;
        foreach (var (seed, a, b, c) in bases)
        {
            ulong reference = CounterRng.Key(seed, RandomPurpose.SatelliteOrbit, a, b, c);
            for (int bit = 0; bit < 64; bit++)
            {
                long m = 1L << bit;
                ulong[] flipped =
                [
                    CounterRng.Key(seed ^ (1UL << bit), RandomPurpose.SatelliteOrbit, a, b, c),
                    CounterRng.Key(seed, (RandomPurpose)((ulong)RandomPurpose.SatelliteOrbit ^ (1UL << bit)), a, b, c),
                    CounterRng.Key(seed, RandomPurpose.SatelliteOrbit, a ^ m, b, c),
                    CounterRng.Key(seed, RandomPurpose.SatelliteOrbit, a, b ^ m, c),
                    CounterRng.Key(seed, RandomPurpose.SatelliteOrbit, a, b, c ^ m),
                ];
                foreach (ulong k in flipped)
                {
                    int distance = BitOperations.PopCount(k ^ reference);
                    Assert.True(distance >= 1, "a flipped input bit left the key unchanged");
                    total += distance;
                    flips++;
                }
            }
        }

        double meanDistance = (double)total / flips;
        double tolerance = 4.5 * 4.0 / Math.Sqrt(flips);
        Assert.InRange(meanDistance, 32.0 - tolerance, 32.0 + tolerance);
    }

    [Fact]
    public void Keys_a_golden_multiple_apart_do_not_give_shifted_copies_of_one_stream()
    {
        // The reason for the second, keyed round in Bits: with the bare SplitMix64 counter,
        // Bits(k + d * Golden, c) would equal Bits(k, c + d).
        for (ulong d = 1; d <= 16; d++)
        {
            for (ulong c = 0; c < 64; c++)
            {
                ulong k = CounterRng.Key(3, RandomPurpose.Spare, (long)c, 0, 0);
                Assert.NotEqual(CounterRng.Bits(k, c + d), CounterRng.Bits(unchecked(k + d * Mix64.Golden), c));
            }
        }
    }
}

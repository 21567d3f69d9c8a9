using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Random;

/// <summary>
/// A counter-based random generator: every draw is a pure function of a 64-bit stream key and a
/// 64-bit counter, so results never depend on threads, tiles, shards or the order of evaluation.
/// </summary>
/// <remarks>
/// <para><b>Keys.</b> <see cref="Key"/> absorbs the words (seed, purpose, a, b, c) one at a time:
/// h0 = IV; h_i = Moremur(h_(i-1) xor SplitMix(w_i + i * Golden)), i = 1..5. Pre-mixing each word
/// with a position-dependent offset makes small structured words (trial 0, 1, 2 ...) look random
/// and makes the key depend on the position of each word. With the other words fixed, the key is a
/// bijection of any single word, so changing one word always changes the key.</para>
/// <para><b>Bits.</b> <see cref="Bits"/> = Moremur(SplitMix(key + (counter + 1) * Golden) xor key).
/// The first round is the SplitMix64 generator run as a counter (Weyl sequence + finalizer). The
/// second round, keyed again, removes the one weakness of the bare SplitMix64 construction when used
/// with many keys: two keys that differ by a multiple d * Golden would give the same stream shifted
/// by d counters (with 1e9 keys of a few thousand draws each such a pair is likely). For a fixed key
/// the map counter -> bits is a bijection, so a stream never repeats within 2^64 draws.</para>
/// <para><b>Uniforms</b> lie on the grid (m + 1/2) * 2^-52, m = bits >> 12: strictly inside (0, 1),
/// exact, symmetric about 1/2. (The 53-bit form ((bits >> 11) + 0.5) * 2^-53 would round its top value
/// to exactly 1.0, because 2^53 - 1/2 is not a double.) Smallest uniform 2^-53, so |normal| &lt;= 8.57.</para>
/// <para><b>Normals</b> come from Box-Muller on the pair p = index >> 1 (counters 2p and 2p + 1).</para>
/// </remarks>
public static class CounterRng
{
    private const ulong KeyIv = 0x243F6A8885A308D3UL; // fractional digits of pi: a nothing-up-my-sleeve start
    internal const double TwoPi = 2.0 * Math.PI;
    internal const double HalfUlpOfUnit = 1.0 / (1UL << 53); // 2^-53

    /// <summary>
    /// The key of one random stream from the run seed, the purpose and three free words (for
    /// instance trial, epoch and satellite or user). Distinct inputs give unrelated keys.
    /// </summary>
    public static ulong Key(ulong seed, RandomPurpose purpose, long a, long b, long c)
    {
        ulong h = KeyIv;
        h = Absorb(h, seed, 1);
        h = Absorb(h, (ulong)purpose, 2);
        h = Absorb(h, unchecked((ulong)a), 3);
        h = Absorb(h, unchecked((ulong)b), 4);
        return Absorb(h, unchecked((ulong)c), 5);
    }

    /// <summary>
    /// <see cref="Key"/> in steps, for callers that draw many keys sharing their first words:
    /// Key(seed, purpose, a, b, c) = KeyWithC(KeyWithB(KeyWithA(KeyStart(seed, purpose), a), b), c),
    /// bit for bit. The satellite-error sampler keeps the state after (seed, purpose, trial) per trial.
    /// </summary>
    public static ulong KeyStart(ulong seed, RandomPurpose purpose) => Absorb(Absorb(KeyIv, seed, 1), (ulong)purpose, 2);

    /// <summary>The key state after word a (see <see cref="KeyStart"/>).</summary>
    public static ulong KeyWithA(ulong state, long a) => Absorb(state, unchecked((ulong)a), 3);

    /// <summary>The key state after word b (see <see cref="KeyStart"/>).</summary>
    public static ulong KeyWithB(ulong state, long b) => Absorb(state, unchecked((ulong)b), 4);

    /// <summary>The finished key after word c (see <see cref="KeyStart"/>).</summary>
    public static ulong KeyWithC(ulong state, long c) => Absorb(state, unchecked((ulong)c), 5);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong Absorb(ulong h, ulong word, ulong position) => Mix64.Moremur(h ^ Premix(word, position));

    /// <summary>
    /// Word b as <see cref="KeyWithB"/> absorbs it, pre-mixed: KeyWithB(state, b) =
    /// Moremur(state xor WordB(b)), so a caller finishing many keys with the same word mixes it once.
    /// </summary>
    internal static ulong WordB(long b) => Premix(unchecked((ulong)b), 4);

    /// <summary>Word c as <see cref="KeyWithC"/> absorbs it, pre-mixed (see <see cref="WordB"/>).</summary>
    internal static ulong WordC(long c) => Premix(unchecked((ulong)c), 5);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong Premix(ulong word, ulong position) => Mix64.SplitMix(unchecked(word + position * Mix64.Golden));

    /// <summary>64 random bits number <paramref name="counter"/> of the stream <paramref name="key"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong Bits(ulong key, ulong counter) =>
        Mix64.Moremur(Mix64.SplitMix(unchecked(key + (counter + 1) * Mix64.Golden)) ^ key);

    /// <summary>Uniform number <paramref name="counter"/> of the stream, in the open interval (0, 1).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Uniform(ulong key, ulong counter) => UniformFromBits(Bits(key, counter));

    /// <summary>Maps 64 random bits to (m + 1/2) * 2^-52 with m = bits >> 12 (exact; never 0 or 1).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double UniformFromBits(ulong bits) =>
        BitConverter.UInt64BitsToDouble((bits >> 12) | 0x3FF0000000000000UL) - 1.0 + HalfUlpOfUnit;

    /// <summary>
    /// Standard normal number <paramref name="index"/> of the stream <paramref name="key"/>
    /// (Box-Muller on pair p = index >> 1: r = sqrt(-2 ln u1), even index r cos(2 pi u2), odd r sin(2 pi u2)).
    /// </summary>
    public static double Normal(ulong key, ulong index)
    {
        ulong p = index >> 1;
        double u1 = Uniform(key, 2 * p);
        double u2 = Uniform(key, 2 * p + 1);
        double r = Math.Sqrt(-2.0 * Math.Log(u1));
        double angle = TwoPi * u2;
        return (index & 1) == 0 ? r * Math.Cos(angle) : r * Math.Sin(angle);
    }

    /// <summary>
    /// Fills <paramref name="destination"/>[j] = <see cref="Normal"/>(key, firstIndex + j), vectorised
    /// when <see cref="Vector256.IsHardwareAccelerated"/>; agrees with <see cref="FillNormalsScalar"/>
    /// to 1e-12 absolute (the vector log and sine may differ from Math's in the last bits).
    /// Range: firstIndex + destination.Length &lt; 2^64. Allocates nothing.
    /// </summary>
    public static void FillNormals(ulong key, ulong firstIndex, Span<double> destination)
    {
        if (destination.IsEmpty)
        {
            return;
        }

        int done = 0;
        if ((firstIndex & 1) != 0)
        {
            destination[0] = Normal(key, firstIndex); // the sine half of a pair: align to a pair start
            done = 1;
        }

        if (Vector256.IsHardwareAccelerated)
        {
            done += NormalKernel256.FillPairs(key, (firstIndex + (ulong)done) >> 1, destination[done..]);
        }

        FillNormalsScalar(key, firstIndex + (ulong)done, destination[done..]);
    }

    /// <summary>The scalar twin of <see cref="FillNormals"/>: bit-identical to <see cref="Normal"/>.</summary>
    public static void FillNormalsScalar(ulong key, ulong firstIndex, Span<double> destination)
    {
        int j = 0;
        if (destination.IsEmpty)
        {
            return;
        }

        if ((firstIndex & 1) != 0)
        {
            destination[0] = Normal(key, firstIndex);
            j = 1;
        }

        ulong counter = firstIndex + (ulong)j; // even: the first counter of a pair
        for (; j + 1 < destination.Length; j += 2, counter += 2)
        {
            double r = Math.Sqrt(-2.0 * Math.Log(Uniform(key, counter)));
            double angle = TwoPi * Uniform(key, counter + 1);
            destination[j] = r * Math.Cos(angle);
            destination[j + 1] = r * Math.Sin(angle);
        }

        if (j < destination.Length)
        {
            destination[j] = Normal(key, counter);
        }
    }
}

using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Random;

/// <summary>
/// The first few normals of many streams at once, one stream per lane, four lanes per Vector256.
/// The satellite-level errors draw three orbit normals and one clock pair per (satellite, trial) from a
/// key of their own per trial, so their vector runs across trials (keys), not along one stream as
/// <see cref="NormalKernel256"/> does.
/// </summary>
/// <remarks>
/// Normal i of lane j is <see cref="CounterRng.Normal"/>(keys[j], i) with the same uniforms (counters
/// 2p and 2p + 1 of pair p = i / 2) and <see cref="FastMath256"/>'s logarithm and sine/cosine in place of
/// Math's: within about 1e-13 of it (tests hold it). Every lane is computed by the same operations
/// whatever its position, so a trial's normals do not depend on the block it falls in, and the result
/// should be the same on hardware without Vector256 (the software form of each operation is the same
/// correctly rounded IEEE operation; not run on such hardware here).
/// </remarks>
internal static class LaneNormals
{
    /// <summary>Lanes per vector step; callers pad their spans to a multiple of it.</summary>
    public const int Lanes = 4;

    /// <summary>
    /// keys[j] = Moremur(states[j] xor premixedWord) for every j: the last absorption of
    /// <see cref="CounterRng.KeyWithB"/> or <see cref="CounterRng.KeyWithC"/> with the word pre-mixed by
    /// <see cref="CounterRng.WordB"/> or <see cref="CounterRng.WordC"/>. States and keys may be the same span.
    /// Range: keys.Length a multiple of <see cref="Lanes"/>, states at least as long.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void FinishKeys(ReadOnlySpan<ulong> states, ulong premixedWord, Span<ulong> keys)
    {
        CheckLanes(keys.Length);
        if (states.Length < keys.Length)
        {
            throw new ArgumentException($"Need {keys.Length} states, got {states.Length}.", nameof(states));
        }

        ref ulong from = ref MemoryMarshal.GetReference(states);
        ref ulong to = ref MemoryMarshal.GetReference(keys);
        var word = Vector256.Create(premixedWord);
        for (int j = 0; j < keys.Length; j += Lanes)
        {
            Mix64.Moremur(Vector256.LoadUnsafe(ref from, (nuint)j) ^ word).StoreUnsafe(ref to, (nuint)j);
        }
    }

    /// <summary>
    /// destination[i * stride + j] = normal i of the stream keys[j], for i in [0, normals) and every j.
    /// Range: 1 &lt;= normals &lt;= 4; keys.Length a multiple of <see cref="Lanes"/>; stride &gt;= keys.Length;
    /// destination holds (normals - 1) * stride + keys.Length values.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void FillHeads(ReadOnlySpan<ulong> keys, int normals, Span<double> destination, int stride)
    {
        CheckLanes(keys.Length);
        ArgumentOutOfRangeException.ThrowIfLessThan(normals, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(normals, 4);
        ArgumentOutOfRangeException.ThrowIfLessThan(stride, keys.Length);
        if (destination.Length < ((normals - 1) * stride) + keys.Length)
        {
            throw new ArgumentException($"Need {((normals - 1) * stride) + keys.Length} values, got {destination.Length}.", nameof(destination));
        }

        ref ulong key0 = ref MemoryMarshal.GetReference(keys);
        ref double dst = ref MemoryMarshal.GetReference(destination);
        var golden = Vector256.Create(Mix64.Golden);
        var exponentOfOne = Vector256.Create(0x3FF0000000000000UL);
        var halfUlp = Vector256.Create(CounterRng.HalfUlpOfUnit);
        var minusTwo = Vector256.Create(-2.0);
        for (int j = 0; j < keys.Length; j += Lanes)
        {
            var key = Vector256.LoadUnsafe(ref key0, (nuint)j);
            for (int i = 0; i < normals; i += 2)
            {
                // Bits(key, c) = Moremur(SplitMix(key + (c + 1) Golden) xor key) for c = i, i + 1.
                var weyl = key + (Vector256.Create((ulong)(i + 1)) * golden);
                var radiusBits = Mix64.Moremur(Mix64.SplitMix(weyl) ^ key);
                var angleBits = Mix64.Moremur(Mix64.SplitMix(weyl + golden) ^ key);
                var u = ((radiusBits >> 12) | exponentOfOne).AsDouble() - Vector256<double>.One + halfUlp;
                var r = Vector256.Sqrt(minusTwo * FastMath256.LogOfPositive(u));
                (Vector256<double> sin, Vector256<double> cos) = FastMath256.SinCosOfTurn(angleBits);
                (r * cos).StoreUnsafe(ref dst, (nuint)((i * stride) + j));
                if (i + 1 < normals)
                {
                    (r * sin).StoreUnsafe(ref dst, (nuint)(((i + 1) * stride) + j));
                }
            }
        }
    }

    private static void CheckLanes(int length)
    {
        if (length % Lanes != 0)
        {
            throw new ArgumentException($"Lane count {length} is not a multiple of {Lanes}.", nameof(length));
        }
    }
}

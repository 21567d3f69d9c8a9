using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Random;

/// <summary>
/// The Vector256 Box-Muller kernel behind <see cref="CounterRng.FillNormals"/>: four pairs (eight
/// normals) per step, lanes j = 0..3 holding pairs p0 + j. Same bits and uniforms as the scalar path;
/// the logarithm and the sine and cosine are <see cref="FastMath256"/>'s polynomials, within about
/// 1e-15 of Math.Log / Sin / Cos on this domain (so the normals agree with the scalar path to 1e-13).
/// </summary>
internal static class NormalKernel256
{
    /// <summary>
    /// Writes whole blocks of eight normals, starting at normal index 2 * <paramref name="firstPair"/>;
    /// returns how many were written (a multiple of 8, at most destination.Length).
    /// </summary>
    // AggressiveOptimization: under tiered compilation a method calling Vector256.Log / SinCos can
    // stay ~20x slow (REFERENCE.md, speed facts); this skips tier 0 and OSR.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static int FillPairs(ulong key, ulong firstPair, Span<double> destination)
    {
        int blocks = destination.Length / 8;
        ref double dst = ref MemoryMarshal.GetReference(destination);

        // Weyl values key + (counter + 1) * Golden for counters 2p (u1) and 2p + 1 (u2), p = firstPair + j.
        Vector256<ulong> keys = Vector256.Create(key);
        Vector256<ulong> golden = Vector256.Create(Mix64.Golden);
        Vector256<ulong> firstCounters = Vector256.Create(2 * firstPair) + Vector256.Create(0UL, 2, 4, 6);
        Vector256<ulong> weyl1 = keys + (firstCounters + Vector256<ulong>.One) * golden;
        Vector256<ulong> weyl2 = weyl1 + golden;
        Vector256<ulong> step = Vector256.Create(unchecked(8 * Mix64.Golden));

        Vector256<ulong> exponentOfOne = Vector256.Create(0x3FF0000000000000UL);
        Vector256<double> one = Vector256<double>.One;
        Vector256<double> halfUlp = Vector256.Create(CounterRng.HalfUlpOfUnit);
        Vector256<double> minusTwo = Vector256.Create(-2.0);
        Vector256<long> lowPairs = Vector256.Create(0L, 0, 1, 1);
        Vector256<long> highPairs = Vector256.Create(2L, 2, 3, 3);
        Vector256<double> oddLanes = Vector256.Create(0UL, ulong.MaxValue, 0, ulong.MaxValue).AsDouble();

        for (int b = 0; b < blocks; b++)
        {
            Vector256<ulong> bits1 = Mix64.Moremur(Mix64.SplitMix(weyl1) ^ keys);
            Vector256<ulong> bits2 = Mix64.Moremur(Mix64.SplitMix(weyl2) ^ keys);
            Vector256<double> u1 = ((bits1 >> 12) | exponentOfOne).AsDouble() - one + halfUlp;

            Vector256<double> r = Vector256.Sqrt(minusTwo * FastMath256.LogOfPositive(u1));
            (Vector256<double> sin, Vector256<double> cos) = FastMath256.SinCosOfTurn(bits2);
            Vector256<double> even = r * cos;
            Vector256<double> odd = r * sin;

            // Interleave to normal order: [c0 s0 c1 s1] [c2 s2 c3 s3].
            Vector256<double> low = Vector256.ConditionalSelect(
                oddLanes, Vector256.Shuffle(odd, lowPairs), Vector256.Shuffle(even, lowPairs));
            Vector256<double> high = Vector256.ConditionalSelect(
                oddLanes, Vector256.Shuffle(odd, highPairs), Vector256.Shuffle(even, highPairs));
            low.StoreUnsafe(ref dst, (nuint)(8 * b));
            high.StoreUnsafe(ref dst, (nuint)(8 * b + 4));

            weyl1 += step;
            weyl2 += step;
        }

        return 8 * blocks;
    }
}

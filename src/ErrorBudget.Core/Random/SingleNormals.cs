using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Random;

/// <summary>
/// Standard normals in single precision for the hot loop, indexed by trial, from one 64-bit draw per
/// Box-Muller pair (the double-precision <see cref="CounterRng.FillNormals"/> spends two).
/// </summary>
/// <remarks>
/// <para><b>Layout.</b> Trials come in groups of 16: trial t = 16 g + 8 h + l (l = 0..7) takes pair
/// p = 8 g + l of the stream, its cosine half for h = 0 and its sine half for h = 1, so eight
/// consecutive trials are one Vector256 of cosines or of sines.</para>
/// <para><b>Bits.</b> b = <see cref="CounterRng.Bits"/>(key, p). The top 40 bits give the radius
/// uniform u = (b_hi24 + (b_mid16 + 1/2) 2^-16) 2^-24 in [2^-41, 1] (in float), the low 24 bits the
/// angle 2 pi (a + 1/2) 2^-24. The radius sqrt(-2 ln u) is at most sqrt(82 ln 2) = 7.54: the pairs
/// beyond it (probability exp(-7.54^2 / 2) = 2^-41 = 4.5e-13 per pair, below what any run resolves)
/// are missing, so no normal exceeds 7.54 sigma; the angle's 24 bits place it to 6e-8 of a turn.</para>
/// <para>The vector and scalar forms give identical bits (<see cref="FastMathSingle"/>).</para>
/// </remarks>
internal static class SingleNormals
{
    private const float TwoToMinus24 = 1f / (1 << 24);
    private const float TwoToMinus40 = TwoToMinus24 / (1 << 16);

    /// <summary>
    /// Writes the normals of trials [firstTrial, firstTrial + destination.Length) of stream
    /// <paramref name="key"/>. Vector groups (Vector512 where accelerated, else Vector256) where the
    /// trials are group-aligned, the scalar form elsewhere (same bits). Allocates nothing.
    /// </summary>
    public static void Fill(ulong key, long firstTrial, Span<float> destination) =>
        Fill(key, firstTrial, destination, VectorBits);

    /// <summary>The widest vector the hardware accelerates for <see cref="Fill(ulong, long, Span{float})"/>: 512, 256 or 0.</summary>
    internal static readonly int VectorBits =
        Vector512.IsHardwareAccelerated ? 512 : Vector256.IsHardwareAccelerated ? 256 : 0;

    /// <summary>
    /// <see cref="Fill(ulong, long, Span{float})"/> with a chosen vector width: 512 (two groups per step),
    /// 256 (one group per step), or 0 for the scalar form. Every width writes the
    /// same bits. Range: vectorBits in {0, 256, 512}, at most what the hardware accelerates.
    /// </summary>
    internal static void Fill(ulong key, long firstTrial, Span<float> destination, int vectorBits)
    {
        int i = 0;
        if (vectorBits > 0)
        {
            while (i < destination.Length && ((firstTrial + i) & 15) != 0)
            {
                destination[i] = OfTrial(key, firstTrial + i);
                i++;
            }

            i += vectorBits == 512
                ? FillGroupPairs(key, (firstTrial + i) >> 4, destination[i..])
                : FillGroups(key, (firstTrial + i) >> 4, destination[i..]);
        }

        for (; i < destination.Length; i++)
        {
            destination[i] = OfTrial(key, firstTrial + i);
        }
    }

    /// <summary>The scalar form of <see cref="Fill"/>: the normal of one trial.</summary>
    public static float OfTrial(ulong key, long trial)
    {
        ulong pair = (ulong)(((trial >> 4) << 3) + (trial & 7));
        ulong bits = CounterRng.Bits(key, pair);
        uint high = (uint)(bits >> 32);
        uint low = (uint)bits;
        float u = MathF.FusedMultiplyAdd((int)((((high & 0xFF) << 8) | (low >> 24)) * 2 + 1), TwoToMinus40 / 2, (int)(high >> 8) * TwoToMinus24);
        float r = MathF.Sqrt(-2f * FastMathSingle.Log(u));
        (float sin, float cos) = FastMathSingle.SinCosOfTurn((int)(low & 0xFFFFFF));
        return ((trial >> 3) & 1) == 0 ? r * cos : r * sin;
    }

    /// <summary>
    /// Groups of 16 trials from group <paramref name="firstGroup"/>, and the cosine half of one more
    /// when 8 to 15 normals remain; returns the normals written (a multiple of 8).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int FillGroups(ulong key, long firstGroup, Span<float> destination)
    {
        int groups = (destination.Length + 8) / 16;
        ref float dst = ref MemoryMarshal.GetReference(destination);
        Vector256<ulong> keys = Vector256.Create(key);
        Vector256<ulong> golden = Vector256.Create(Mix64.Golden);
        // Weyl values key + (p + 1) Golden for the group's pairs p = 8 g + 0..3 and 8 g + 4..7.
        Vector256<ulong> weylLow = keys + ((Vector256.Create((ulong)(8 * firstGroup)) + Vector256.Create(1UL, 2, 3, 4)) * golden);
        Vector256<ulong> weylHigh = weylLow + Vector256.Create(unchecked(4 * Mix64.Golden));
        Vector256<ulong> step = Vector256.Create(unchecked(8 * Mix64.Golden));
        Vector256<uint> byteMask = Vector256.Create(0xFFu);
        Vector256<float> minusTwo = Vector256.Create(-2f);
        for (int g = 0; g < groups; g++)
        {
            Vector256<ulong> bitsLow = Mix64.Moremur(Mix64.SplitMix(weylLow) ^ keys);
            Vector256<ulong> bitsHigh = Mix64.Moremur(Mix64.SplitMix(weylHigh) ^ keys);
            Vector256<uint> high = Vector256.Narrow(bitsLow >> 32, bitsHigh >> 32);
            Vector256<uint> low = Vector256.Narrow(bitsLow, bitsHigh);
            Vector256<int> middle = (((high & byteMask) << 8) | (low >> 24)).AsInt32();
            Vector256<float> u = Vector256.FusedMultiplyAdd(
                Vector256.ConvertToSingle((middle * 2) + Vector256<int>.One),
                Vector256.Create(TwoToMinus40 / 2),
                Vector256.ConvertToSingle((high >> 8).AsInt32()) * Vector256.Create(TwoToMinus24));
            Vector256<float> r = Vector256.Sqrt(minusTwo * FastMathSingle.Log(u));
            (Vector256<float> sin, Vector256<float> cos) = FastMathSingle.SinCosOfTurn((low & Vector256.Create(0xFFFFFFu)).AsInt32());
            (r * cos).StoreUnsafe(ref dst, (nuint)(16 * g));
            if ((16 * g) + 16 > destination.Length)
            {
                return (16 * g) + 8; // the half group: its sines belong to trials past the end
            }

            (r * sin).StoreUnsafe(ref dst, (nuint)((16 * g) + 8));
            weylLow += step;
            weylHigh += step;
        }

        return 16 * groups;
    }

    /// <summary>
    /// <see cref="FillGroups"/> two groups per step: the eight pairs of a group in one Vector512 of
    /// 64-bit draws, the 32 normals of two groups in two Vector512 of float (cosine and sine halves).
    /// A last step that is not whole stores only its first 8, 16 or 24 normals (the halves that fall
    /// inside the span); returns the normals written (a multiple of 8), so <see cref="FillGroups"/>
    /// gets nothing and only a tail under 8 falls to the scalar form. Same operations per lane, so
    /// the same bits. Software-pipelined: the next step's mixers are computed beside this step's
    /// logarithm and sine/cosine (336 normals 824 -> 750 - 767 ns, alternating scratch runs, 2026-12-03).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int FillGroupPairs(ulong key, long firstGroup, Span<float> destination)
    {
        int written = destination.Length / 8 * 8;
        int steps = (written + 31) / 32;
        ref float dst = ref MemoryMarshal.GetReference(destination);
        Vector512<ulong> keys = Vector512.Create(key);
        Vector512<ulong> golden = Vector512.Create(Mix64.Golden);
        Vector512<ulong> weylFirst = keys + ((Vector512.Create((ulong)(8 * firstGroup)) + Vector512.Create(1UL, 2, 3, 4, 5, 6, 7, 8)) * golden);
        Vector512<ulong> weylSecond = weylFirst + Vector512.Create(unchecked(8 * Mix64.Golden));
        Vector512<ulong> step = Vector512.Create(unchecked(16 * Mix64.Golden));
        Vector512<uint> byteMask = Vector512.Create(0xFFu);
        Vector512<float> minusTwo = Vector512.Create(-2f);
        // Software pipeline: the next step's mixers (a long chain of 64-bit multiplies) are issued beside
        // this step's logarithm and sine/cosine, so the core always has two independent chains in its window.
        Vector512<ulong> bitsFirst = Mix64.Moremur(Mix64.SplitMix(weylFirst) ^ keys);
        Vector512<ulong> bitsSecond = Mix64.Moremur(Mix64.SplitMix(weylSecond) ^ keys);
        for (int k = 0; k < steps; k++)
        {
            weylFirst += step;
            weylSecond += step;
            Vector512<ulong> nextFirst = Mix64.Moremur(Mix64.SplitMix(weylFirst) ^ keys);
            Vector512<ulong> nextSecond = Mix64.Moremur(Mix64.SplitMix(weylSecond) ^ keys);
            Vector512<uint> high = Vector512.Narrow(bitsFirst >> 32, bitsSecond >> 32);
            Vector512<uint> low = Vector512.Narrow(bitsFirst, bitsSecond);
            Vector512<int> middle = (((high & byteMask) << 8) | (low >> 24)).AsInt32();
            Vector512<float> u = Vector512.FusedMultiplyAdd(
                Vector512.ConvertToSingle((middle * 2) + Vector512<int>.One),
                Vector512.Create(TwoToMinus40 / 2),
                Vector512.ConvertToSingle((high >> 8).AsInt32()) * Vector512.Create(TwoToMinus24));
            Vector512<float> r = Vector512.Sqrt(minusTwo * FastMathSingle.Log(u));
            (Vector512<float> sin, Vector512<float> cos) = FastMathSingle.SinCosOfTurn((low & Vector512.Create(0xFFFFFFu)).AsInt32());
            Vector512<float> cosines = r * cos, sines = r * sin;
            int o = 32 * k;
            cosines.GetLower().StoreUnsafe(ref dst, (nuint)o);
            if (o + 32 > written)
            {
                if (o + 16 <= written)
                {
                    sines.GetLower().StoreUnsafe(ref dst, (nuint)(o + 8));
                }

                if (o + 24 <= written)
                {
                    cosines.GetUpper().StoreUnsafe(ref dst, (nuint)(o + 16));
                }

                break;
            }

            sines.GetLower().StoreUnsafe(ref dst, (nuint)(o + 8));
            cosines.GetUpper().StoreUnsafe(ref dst, (nuint)(o + 16));
            sines.GetUpper().StoreUnsafe(ref dst, (nuint)(o + 24));
            bitsFirst = nextFirst;
            bitsSecond = nextSecond;
        }

        return written;
    }

}

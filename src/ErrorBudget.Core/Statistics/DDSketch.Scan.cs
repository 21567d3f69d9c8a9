using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Statistics;

/// <summary>
/// The key scan of <see cref="DDSketch"/>'s bulk inserts: lowest and highest non-zero key and the
/// number of zero keys, vectorised with a scalar twin that gives the same answer.
/// </summary>
public sealed partial class DDSketch
{
    /// <summary>The widest vector the hardware accelerates: 512, 256 or 0 (scalar only).</summary>
    internal static readonly int ScanVectorBits =
        Vector512.IsHardwareAccelerated ? 512 : Vector256.IsHardwareAccelerated ? 256 : 0;

    /// <summary>Lowest and highest non-zero key of a span (none: lo &gt; hi) and how many zero keys it holds.</summary>
    internal static void ScanKeys(ReadOnlySpan<int> keys, out int lo, out int hi, out long zeros) =>
        ScanKeys(keys, ScanVectorBits, out lo, out hi, out zeros);

    /// <summary>
    /// <see cref="ScanKeys(ReadOnlySpan{int}, out int, out int, out long)"/> with a chosen vector width:
    /// 512, 256, or 0 for the scalar twin. Every width gives the same result; the vector part covers
    /// whole vectors, a scalar loop the tail. Range: vectorBits in {0, 256, 512}.
    /// </summary>
    internal static void ScanKeys(ReadOnlySpan<int> keys, int vectorBits, out int lo, out int hi, out long zeros)
    {
        lo = int.MaxValue;
        hi = int.MinValue;
        zeros = 0;
        int done = vectorBits switch
        {
            512 => Scan512(keys, ref lo, ref hi, ref zeros),
            256 => Scan256(keys, ref lo, ref hi, ref zeros),
            _ => 0,
        };
        foreach (int key in keys[done..])
        {
            if (key == ZeroKey)
            {
                zeros++;
                continue;
            }

            lo = Math.Min(lo, key);
            hi = Math.Max(hi, key);
        }
    }

    // The two vector loops are the same algorithm at two widths (no public generic vector interface
    // to write it once). Max over the keys directly: ZeroKey = int.MinValue never wins it. Min over
    // the keys with ZeroKey replaced by int.MaxValue, which never wins it either. Zeros: the compare
    // mask is -1 in a zero lane, so subtracting it counts them. Lane counts stay below
    // keys.Length / 8, so the int lanes cannot overflow.

    /// <summary>Scans the whole 512-bit vectors of keys into lo, hi, zeros; returns the keys done.</summary>
    private static int Scan512(ReadOnlySpan<int> keys, ref int lo, ref int hi, ref long zeros)
    {
        int whole = keys.Length - (keys.Length % Vector512<int>.Count);
        if (whole == 0)
        {
            return 0;
        }

        ref int key0 = ref MemoryMarshal.GetReference(keys);
        Vector512<int> zeroKey = Vector512.Create(ZeroKey), top = Vector512.Create(int.MaxValue);
        Vector512<int> low = top, high = Vector512.Create(int.MinValue), zeroLanes = Vector512<int>.Zero;
        for (int i = 0; i < whole; i += Vector512<int>.Count)
        {
            Vector512<int> k = Vector512.LoadUnsafe(ref key0, (nuint)i);
            Vector512<int> isZero = Vector512.Equals(k, zeroKey);
            high = Vector512.Max(high, k);
            low = Vector512.Min(low, Vector512.ConditionalSelect(isZero, top, k));
            zeroLanes -= isZero;
        }

        MergeLanes(Vector256.Min(low.GetLower(), low.GetUpper()), Vector256.Max(high.GetLower(), high.GetUpper()), ref lo, ref hi);
        zeros += Vector512.Sum(zeroLanes);
        return whole;
    }

    /// <summary>The 256-bit twin of <see cref="Scan512"/>.</summary>
    private static int Scan256(ReadOnlySpan<int> keys, ref int lo, ref int hi, ref long zeros)
    {
        int whole = keys.Length - (keys.Length % Vector256<int>.Count);
        if (whole == 0)
        {
            return 0;
        }

        ref int key0 = ref MemoryMarshal.GetReference(keys);
        Vector256<int> zeroKey = Vector256.Create(ZeroKey), top = Vector256.Create(int.MaxValue);
        Vector256<int> low = top, high = Vector256.Create(int.MinValue), zeroLanes = Vector256<int>.Zero;
        for (int i = 0; i < whole; i += Vector256<int>.Count)
        {
            Vector256<int> k = Vector256.LoadUnsafe(ref key0, (nuint)i);
            Vector256<int> isZero = Vector256.Equals(k, zeroKey);
            high = Vector256.Max(high, k);
            low = Vector256.Min(low, Vector256.ConditionalSelect(isZero, top, k));
            zeroLanes -= isZero;
        }

        MergeLanes(low, high, ref lo, ref hi);
        zeros += Vector256.Sum(zeroLanes);
        return whole;
    }

    /// <summary>lo = min(lo, lanes of low), hi = max(hi, lanes of high), by halving (no lane-by-lane spills).</summary>
    private static void MergeLanes(Vector256<int> low, Vector256<int> high, ref int lo, ref int hi)
    {
        Vector128<int> l = Vector128.Min(low.GetLower(), low.GetUpper());
        Vector128<int> h = Vector128.Max(high.GetLower(), high.GetUpper());
        lo = Math.Min(lo, Math.Min(Math.Min(l.GetElement(0), l.GetElement(1)), Math.Min(l.GetElement(2), l.GetElement(3))));
        hi = Math.Max(hi, Math.Max(Math.Max(h.GetElement(0), h.GetElement(1)), Math.Max(h.GetElement(2), h.GetElement(3))));
    }
}

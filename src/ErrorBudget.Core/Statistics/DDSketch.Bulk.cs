using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace ErrorBudget.Core.Statistics;

/// <summary>
/// The bulk inserts of <see cref="DDSketch"/> used by the hot loop: one scan of the keys, one range
/// reservation (and widening check) per sketch, then plain increments.
/// </summary>
/// <remarks>
/// Each loop is written once, generic over the bucket type (uint compact, long wide); the JIT compiles
/// one specialised copy per combination of value types, so the common case (compact cell sketch,
/// wide epoch sketches) runs the same machine code as a hand-written loop.
/// </remarks>
public sealed partial class DDSketch
{
    /// <summary>
    /// Adds the same weight to the buckets of many keys (as <see cref="AddKey"/> for each): the store's
    /// fields stay in registers for the whole span, which is what makes the hot loop's inserts cheap.
    /// Range: weight &gt;= 0.
    /// </summary>
    public void AddKeys(ReadOnlySpan<int> keys, long weight)
    {
        ScanKeys(keys, out int lo, out int hi, out long zeros);
        NoteIncoming(keys.Length, weight);
        CommitIncoming();
        if (lo <= hi)
        {
            ReserveKeys(lo, hi);
            if (compact)
            {
                AddEach(keys, narrow, offset, (uint)weight);
            }
            else
            {
                AddEach(keys, wide, offset, weight);
            }
        }

        AddTotals(keys.Length, zeros, weight);
    }

    /// <summary>
    /// Adds the same keys to two sketches with their own weights, in one pass (as <see cref="AddKeys"/>
    /// on each): the hot loop's cell sketch (weight 1) and epoch share (area weight) see the same samples.
    /// Range: weights &gt;= 0.
    /// </summary>
    public static void AddKeysToBoth(ReadOnlySpan<int> keys, DDSketch first, long firstWeight, DDSketch second, long secondWeight)
    {
        ArgumentNullException.ThrowIfNull(first);
        ArgumentNullException.ThrowIfNull(second);
        ScanKeys(keys, out int lo, out int hi, out long zeros);
        first.NoteIncoming(keys.Length, firstWeight);
        second.NoteIncoming(keys.Length, secondWeight);
        first.CommitIncoming();
        second.CommitIncoming();
        if (lo <= hi)
        {
            first.ReserveKeys(lo, hi);
            second.ReserveKeys(lo, hi);
            int a = first.offset, b = second.offset;
            switch ((first.compact, second.compact))
            {
                case (true, false): AddEach(keys, first.narrow, a, (uint)firstWeight, second.wide, b, secondWeight); break;
                case (false, false): AddEach(keys, first.wide, a, firstWeight, second.wide, b, secondWeight); break;
                case (true, true): AddEach(keys, first.narrow, a, (uint)firstWeight, second.narrow, b, (uint)secondWeight); break;
                case (false, true): AddEach(keys, first.wide, a, firstWeight, second.narrow, b, (uint)secondWeight); break;
            }
        }

        first.AddTotals(keys.Length, zeros, firstWeight);
        second.AddTotals(keys.Length, zeros, secondWeight);
    }

    /// <summary>
    /// Adds every key to <paramref name="first"/> (weight <paramref name="firstWeight"/>) and to
    /// <paramref name="all"/> (weight <paramref name="allWeight"/>), and the keys of segment g
    /// (keys [ends[g-1], ends[g]), ends[-1] = 0) to <paramref name="segments"/>[g] with
    /// <paramref name="allWeight"/>: one scan of the keys and one range reservation per sketch, then
    /// plain increments. Splits an epoch's samples into trial batches without a second pass.
    /// Range: weights &gt;= 0; ends non-decreasing.
    /// </summary>
    public static void AddKeysSegmented(
        ReadOnlySpan<int> keys, DDSketch first, long firstWeight, DDSketch all, long allWeight, ReadOnlySpan<int> ends, ReadOnlySpan<DDSketch> segments)
    {
        ArgumentNullException.ThrowIfNull(first);
        ArgumentNullException.ThrowIfNull(all);
        if (ends.Length != segments.Length || (ends.Length > 0 && ends[^1] != keys.Length))
        {
            throw new ArgumentException("Need one sketch per segment and segments that end at the last key.", nameof(ends));
        }

        int previous = 0;
        foreach (int end in ends)
        {
            if (end < previous)
            {
                throw new ArgumentException("Segment ends must not decrease (nor be negative).", nameof(ends));
            }

            previous = end;
        }

        // Every widening check before any store is touched: a sketch may play several roles, so each
        // first notes all the weight it is about to receive, then decides once.
        first.NoteIncoming(keys.Length, firstWeight);
        all.NoteIncoming(keys.Length, allWeight);
        int start = 0;
        for (int g = 0; g < segments.Length; g++)
        {
            segments[g].NoteIncoming(ends[g] - start, allWeight);
            start = ends[g];
        }

        first.CommitIncoming();
        all.CommitIncoming();
        foreach (DDSketch segment in segments)
        {
            segment.CommitIncoming();
        }

        ScanKeys(keys, out int lo, out int hi, out long zeros);
        if (lo <= hi)
        {
            first.ReserveKeys(lo, hi);
            all.ReserveKeys(lo, hi);
            foreach (DDSketch segment in segments)
            {
                segment.ReserveKeys(lo, hi);
            }
        }

        int a = first.offset, c = all.offset;
        switch ((first.compact, all.compact))
        {
            case (true, false): AddSegments(keys, first.narrow, a, (uint)firstWeight, all.wide, c, allWeight, ends, segments, allWeight); break;
            case (false, false): AddSegments(keys, first.wide, a, firstWeight, all.wide, c, allWeight, ends, segments, allWeight); break;
            case (true, true): AddSegments(keys, first.narrow, a, (uint)firstWeight, all.narrow, c, (uint)allWeight, ends, segments, allWeight); break;
            case (false, true): AddSegments(keys, first.wide, a, firstWeight, all.narrow, c, (uint)allWeight, ends, segments, allWeight); break;
        }

        first.AddTotals(keys.Length, zeros, firstWeight);
        all.AddTotals(keys.Length, zeros, allWeight);
    }

    /// <summary>The segment loop of <see cref="AddKeysSegmented"/> for one pair of first/all bucket types.</summary>
    private static void AddSegments<TA, TC>(
        ReadOnlySpan<int> keys, TA[] a, int aShift, TA aWeight, TC[] c, int cShift, TC cWeight, ReadOnlySpan<int> ends, ReadOnlySpan<DDSketch> segments, long allWeight)
        where TA : unmanaged, IBinaryInteger<TA>
        where TC : unmanaged, IBinaryInteger<TC>
    {
        int start = 0;
        for (int g = 0; g < segments.Length; g++)
        {
            DDSketch second = segments[g];
            ReadOnlySpan<int> segment = keys[start..ends[g]];
            start = ends[g];
            long segmentZeros = second.compact
                ? AddEach(segment, a, aShift, aWeight, second.narrow, second.offset, (uint)allWeight, c, cShift, cWeight)
                : AddEach(segment, a, aShift, aWeight, second.wide, second.offset, allWeight, c, cShift, cWeight);
            second.AddTotals(segment.Length, segmentZeros, allWeight);
        }
    }

    /// <summary>Adds <paramref name="weight"/> to the bucket of every non-zero key (store already reserved).</summary>
    private static void AddEach<T>(ReadOnlySpan<int> keys, T[] counts, int shift, T weight)
        where T : unmanaged, IBinaryInteger<T>
    {
        ref T bucket0 = ref MemoryMarshal.GetArrayDataReference(counts);
        foreach (int key in keys)
        {
            if (key != ZeroKey)
            {
                Unsafe.Add(ref bucket0, key - shift) += weight;
            }
        }
    }

    /// <summary>The two-sketch form of <see cref="AddEach{T}(ReadOnlySpan{int}, T[], int, T)"/>.</summary>
    private static void AddEach<TA, TB>(ReadOnlySpan<int> keys, TA[] a, int aShift, TA aWeight, TB[] b, int bShift, TB bWeight)
        where TA : unmanaged, IBinaryInteger<TA>
        where TB : unmanaged, IBinaryInteger<TB>
    {
        ref TA a0 = ref MemoryMarshal.GetArrayDataReference(a);
        ref TB b0 = ref MemoryMarshal.GetArrayDataReference(b);
        foreach (int key in keys)
        {
            if (key != ZeroKey)
            {
                Unsafe.Add(ref a0, key - aShift) += aWeight;
                Unsafe.Add(ref b0, key - bShift) += bWeight;
            }
        }
    }

    /// <summary>The three-sketch form, returning the number of zero keys (counted on the way).</summary>
    private static long AddEach<TA, TB, TC>(
        ReadOnlySpan<int> keys, TA[] a, int aShift, TA aWeight, TB[] b, int bShift, TB bWeight, TC[] c, int cShift, TC cWeight)
        where TA : unmanaged, IBinaryInteger<TA>
        where TB : unmanaged, IBinaryInteger<TB>
        where TC : unmanaged, IBinaryInteger<TC>
    {
        ref TA a0 = ref MemoryMarshal.GetArrayDataReference(a);
        ref TB b0 = ref MemoryMarshal.GetArrayDataReference(b);
        ref TC c0 = ref MemoryMarshal.GetArrayDataReference(c);
        long zeros = 0;
        foreach (int key in keys)
        {
            if (key != ZeroKey)
            {
                Unsafe.Add(ref a0, key - aShift) += aWeight;
                Unsafe.Add(ref b0, key - bShift) += bWeight;
                Unsafe.Add(ref c0, key - cShift) += cWeight;
            }
            else
            {
                zeros++;
            }
        }

        return zeros;
    }

    /// <summary>Makes [lo, hi] addressable and widens the seen range to it.</summary>
    private void ReserveKeys(int lo, int hi)
    {
        EnsureRange(lo, hi);
        minKey = Math.Min(minKey, lo);
        maxKey = Math.Max(maxKey, hi);
    }

    private void AddTotals(int keyCount, long zeros, long weight)
    {
        zeroCount += zeros * weight;
        count += keyCount * weight;
    }
}

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
    /// <paramref name="all"/> (weight <paramref name="allWeight"/>), and key j to the batch of trial j
    /// of <paramref name="batches"/>' current block (weight <paramref name="allWeight"/>): one scan of
    /// the keys, one range check per store, then one pass of plain increments. Splits an epoch's samples
    /// into trial batches without a second pass. Range: weights &gt;= 0; one key per trial of the block.
    /// </summary>
    public static void AddKeysBatched(
        ReadOnlySpan<int> keys, DDSketch first, long firstWeight, DDSketch all, long allWeight, BatchSketchSet batches)
    {
        ArgumentNullException.ThrowIfNull(first);
        ArgumentNullException.ThrowIfNull(all);
        ArgumentNullException.ThrowIfNull(batches);
        if (keys.Length != batches.BlockTrials)
        {
            throw new ArgumentException($"Need one key per trial of the block ({batches.BlockTrials}), got {keys.Length}.", nameof(keys));
        }

        if (batches.RelativeAccuracy != first.RelativeAccuracy || all.RelativeAccuracy != first.RelativeAccuracy)
        {
            throw new ArgumentException("Relative accuracies differ.", nameof(batches));
        }

        // Every widening check before any store is touched: first and all may be the same sketch.
        first.NoteIncoming(keys.Length, firstWeight);
        all.NoteIncoming(keys.Length, allWeight);
        first.CommitIncoming();
        all.CommitIncoming();
        ScanKeys(keys, out int lo, out int hi, out long zeros);
        if (lo <= hi)
        {
            first.ReserveKeys(lo, hi);
            all.ReserveKeys(lo, hi);
            batches.Reserve(lo, hi);
        }

        int a = first.offset, b = all.offset;
        long[] c = batches.Counts;
        ReadOnlySpan<int> bases = batches.TrialBase;
        switch ((first.compact, all.compact))
        {
            case (true, false): AddEachBatched(keys, first.narrow, a, (uint)firstWeight, all.wide, b, allWeight, c, bases, allWeight); break;
            case (false, false): AddEachBatched(keys, first.wide, a, firstWeight, all.wide, b, allWeight, c, bases, allWeight); break;
            case (true, true): AddEachBatched(keys, first.narrow, a, (uint)firstWeight, all.narrow, b, (uint)allWeight, c, bases, allWeight); break;
            case (false, true): AddEachBatched(keys, first.wide, a, firstWeight, all.narrow, b, (uint)allWeight, c, bases, allWeight); break;
        }

        if (zeros > 0)
        {
            // Zero keys are rare (errors at or below the resolution): their batches in a pass of their own,
            // which keeps the main pass's registers for its three stores.
            AddZerosBatched(keys, batches, allWeight);
        }

        first.AddTotals(keys.Length, zeros, firstWeight);
        all.AddTotals(keys.Length, zeros, allWeight);
        batches.AddBlockTotals(allWeight);
    }

    /// <summary>The pass of <see cref="AddKeysBatched"/> for one pair of first/all bucket types (zero keys are skipped).</summary>
    private static void AddEachBatched<TA, TB>(
        ReadOnlySpan<int> keys, TA[] a, int aShift, TA aWeight, TB[] b, int bShift, TB bWeight, long[] c, ReadOnlySpan<int> cBase, long cWeight)
        where TA : unmanaged, IBinaryInteger<TA>
        where TB : unmanaged, IBinaryInteger<TB>
    {
        ref TA a0 = ref MemoryMarshal.GetArrayDataReference(a);
        ref TB b0 = ref MemoryMarshal.GetArrayDataReference(b);
        ref long c0 = ref MemoryMarshal.GetArrayDataReference(c);
        ref int base0 = ref MemoryMarshal.GetReference(cBase);
        ref int key0 = ref MemoryMarshal.GetReference(keys);
        nint aFrom = aShift, bFrom = bShift; // native-width offsets: one sign extension per key, not three
        for (nint j = 0; j < keys.Length; j++)
        {
            int key = Unsafe.Add(ref key0, j);
            if (key != ZeroKey)
            {
                nint k = key;
                Unsafe.Add(ref a0, k - aFrom) += aWeight;
                Unsafe.Add(ref b0, k - bFrom) += bWeight;
                Unsafe.Add(ref c0, k + Unsafe.Add(ref base0, j)) += cWeight;
            }
        }
    }

    /// <summary>Each zero key's weight to the zero bucket of its trial's batch.</summary>
    private static void AddZerosBatched(ReadOnlySpan<int> keys, BatchSketchSet batches, long weight)
    {
        long[] zeroCounts = batches.ZeroCounts;
        ReadOnlySpan<int> trialBatch = batches.TrialBatch;
        for (int j = 0; j < keys.Length; j++)
        {
            if (keys[j] == ZeroKey)
            {
                zeroCounts[trialBatch[j]] += weight;
            }
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

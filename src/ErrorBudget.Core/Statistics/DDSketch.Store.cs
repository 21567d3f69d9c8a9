namespace ErrorBudget.Core.Statistics;

/// <summary>The dense bucket store of <see cref="DDSketch"/>: growth, merging, clearing, cloning.</summary>
public sealed partial class DDSketch
{
    private const int InitialBuckets = 64;

    private long[] counts = [];
    private int offset;               // the key of counts[0]
    private int minKey = int.MaxValue; // lowest and highest key added (empty: Max > Min)
    private int maxKey = int.MinValue;
    private long zeroCount;
    private long count;

    /// <summary>The weight in the zero bucket.</summary>
    internal long ZeroCount => zeroCount;

    /// <summary>The weight in bucket <paramref name="key"/> (<see cref="ZeroKey"/>: the zero bucket).</summary>
    internal long CountOf(int key)
    {
        if (key == ZeroKey)
        {
            return zeroCount;
        }

        int i = key - offset;
        return (uint)i < (uint)counts.Length ? counts[i] : 0;
    }

    /// <summary>The number of buckets allocated (8 bytes each).</summary>
    internal int AllocatedBuckets => counts.Length;

    /// <summary>
    /// Adds <paramref name="other"/>'s counts times <paramref name="scale"/>, as if each of its values
    /// had been added again with its weight times scale. Exact and order-independent.
    /// Range: equal <see cref="RelativeAccuracy"/>, scale &gt;= 0. Merging a sketch into itself is allowed.
    /// </summary>
    public void Merge(DDSketch other, long scale = 1)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (other.RelativeAccuracy != RelativeAccuracy)
        {
            throw new ArgumentException(
                $"Relative accuracies differ ({other.RelativeAccuracy} vs {RelativeAccuracy}).", nameof(other));
        }

        if (scale < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(scale), scale, "Must be non-negative.");
        }

        int lo = other.minKey;
        int hi = other.maxKey;
        long otherZero = other.zeroCount;
        long otherCount = other.count;
        if (lo <= hi)
        {
            EnsureRange(lo, hi);
            long[] source = other.counts; // read after EnsureRange: other may be this sketch
            int sourceOffset = other.offset;
            for (int key = lo; key <= hi; key++)
            {
                counts[key - offset] += source[key - sourceOffset] * scale;
            }

            minKey = Math.Min(minKey, lo);
            maxKey = Math.Max(maxKey, hi);
        }

        zeroCount += otherZero * scale;
        count += otherCount * scale;
    }

    /// <summary>Removes all weight; keeps the allocated store, so refilling allocates nothing.</summary>
    public void Clear()
    {
        if (minKey <= maxKey)
        {
            Array.Clear(counts, minKey - offset, maxKey - minKey + 1);
        }

        minKey = int.MaxValue;
        maxKey = int.MinValue;
        zeroCount = 0;
        count = 0;
    }

    /// <summary>A deep copy.</summary>
    public DDSketch Clone()
    {
        var copy = new DDSketch(RelativeAccuracy)
        {
            counts = (long[])counts.Clone(),
            offset = offset,
            minKey = minKey,
            maxKey = maxKey,
            zeroCount = zeroCount,
            count = count,
        };
        return copy;
    }

    /// <summary>
    /// Makes keys lo..hi addressable. The new store contains the old one and is at least 9/8 as long,
    /// so growth is amortised O(1) per key (all copies together move at most 9 times the final
    /// length); it
    /// stays below 1.5 times the range of keys ever added plus <see cref="InitialBuckets"/>.
    /// </summary>
    private void EnsureRange(int lo, int hi)
    {
        long oldLo = offset;
        long oldHi = (long)offset + counts.Length - 1;
        if (lo >= oldLo && hi <= oldHi)
        {
            return;
        }

        bool first = counts.Length == 0;
        long needLo = first ? lo : Math.Min(lo, oldLo);
        long needHi = first ? hi : Math.Max(hi, oldHi);
        long needed = needHi - needLo + 1;
        // Grow by an eighth of what is needed, not by doubling or a quarter: a grid of many cells holds
        // one store per cell and sketch, and doubling left them ~2.7x larger than their key range
        // (issue 6, memory). Growth is still geometric (needed contains the old store, so the new one is
        // at least 9/8 of the old), which keeps the copies amortised O(1) per key.
        long length = Math.Max(needed + (needed / 8), Math.Max(counts.Length + (counts.Length / 8), InitialBuckets));
        long slack = length - needed;

        // Spare room: three quarters on the side that grew (growth tends to continue that way), a
        // quarter on the other (tails grow both ways).
        long newOffset = first ? needLo - slack / 2
            : lo < oldLo ? needLo - (3 * slack / 4)
            : needLo - slack / 4;

        var grown = new long[length];
        if (minKey <= maxKey)
        {
            Array.Copy(counts, minKey - offset, grown, minKey - newOffset, maxKey - minKey + 1);
        }

        counts = grown;
        offset = (int)newOffset;
    }
}

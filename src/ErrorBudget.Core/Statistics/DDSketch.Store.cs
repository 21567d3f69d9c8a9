using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Statistics;

/// <summary>The dense bucket store of <see cref="DDSketch"/>: growth, merging, clearing, cloning.</summary>
public sealed partial class DDSketch
{
    private const int InitialBuckets = 64;

    private long[] wide = [];          // the 64-bit store; empty while compact
    private uint[] narrow = [];        // the 32-bit store; empty once wide
    private int offset;                // the key of bucket 0 of the store in use
    private int minKey = int.MaxValue; // lowest and highest key added (empty: Max > Min)
    private int maxKey = int.MinValue;
    private long zeroCount;
    private long count;

    /// <summary>The weight in the zero bucket.</summary>
    internal long ZeroCount => zeroCount;

    /// <summary>The number of buckets allocated (<see cref="BytesPerBucket"/> each).</summary>
    internal int AllocatedBuckets => compact ? narrow.Length : wide.Length;

    /// <summary>
    /// The buckets between the lowest and highest key added (0 when none).
    /// </summary>
    internal int UsedBuckets => minKey <= maxKey ? maxKey - minKey + 1 : 0;

    /// <summary>4 while the counts are compact, 8 once wide.</summary>
    internal int BytesPerBucket => compact ? sizeof(uint) : sizeof(long);

    /// <summary>The bytes of the bucket store (buckets times 4 or 8; the object's few fields not counted).</summary>
    internal long AllocatedBytes => (long)AllocatedBuckets * BytesPerBucket;

    /// <summary>The weight in bucket <paramref name="key"/> (<see cref="ZeroKey"/>: the zero bucket).</summary>
    internal long CountOf(int key)
    {
        if (key == ZeroKey)
        {
            return zeroCount;
        }

        int i = key - offset;
        if ((uint)i >= (uint)AllocatedBuckets)
        {
            return 0;
        }

        return compact ? narrow[i] : wide[i];
    }

    /// <summary>
    /// Adds <paramref name="other"/>'s counts times <paramref name="scale"/>, as if each of its values
    /// had been added again with its weight times scale. Exact and order-independent; either sketch
    /// may be compact or wide. Range: equal <see cref="RelativeAccuracy"/>, scale &gt;= 0. Merging a
    /// sketch into itself is allowed.
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
        NoteIncoming(otherCount, scale);
        CommitIncoming();
        if (lo <= hi)
        {
            EnsureRange(lo, hi);
            // Stores read after widening and EnsureRange: other may be this sketch.
            switch ((compact, other.compact))
            {
                case (true, true): AddScaled(narrow, offset, other.narrow, other.offset, lo, hi, scale); break;
                case (true, false): AddScaled(narrow, offset, other.wide, other.offset, lo, hi, scale); break;
                case (false, true): AddScaled(wide, offset, other.narrow, other.offset, lo, hi, scale); break;
                case (false, false): AddScaled(wide, offset, other.wide, other.offset, lo, hi, scale); break;
            }

            minKey = Math.Min(minKey, lo);
            maxKey = Math.Max(maxKey, hi);
        }

        zeroCount += otherZero * scale;
        count += otherCount * scale;
    }

    /// <summary>Removes all weight; keeps the allocated store (and its width), so refilling allocates nothing.</summary>
    public void Clear()
    {
        if (minKey <= maxKey)
        {
            if (compact)
            {
                Array.Clear(narrow, minKey - offset, maxKey - minKey + 1);
            }
            else
            {
                Array.Clear(wide, minKey - offset, maxKey - minKey + 1);
            }
        }

        minKey = int.MaxValue;
        maxKey = int.MinValue;
        zeroCount = 0;
        count = 0;
    }

    /// <summary>A deep copy (compact if this one is).</summary>
    public DDSketch Clone()
    {
        var copy = new DDSketch(RelativeAccuracy, compact)
        {
            wide = (long[])wide.Clone(),
            narrow = (uint[])narrow.Clone(),
            offset = offset,
            minKey = minKey,
            maxKey = maxKey,
            zeroCount = zeroCount,
            count = count,
        };
        return copy;
    }

    /// <summary>
    /// target[k] += source[k] * scale for keys lo..hi. In a compact target the product is formed in
    /// 32 bits: exact, since the widening check guarantees it fits (arithmetic mod 2^32 of a result
    /// below 2^32).
    /// </summary>
    private static void AddScaled<TT, TS>(TT[] target, int targetOffset, TS[] source, int sourceOffset, int lo, int hi, long scale)
        where TT : unmanaged, IBinaryInteger<TT>
        where TS : unmanaged, IBinaryInteger<TS>
    {
        if (typeof(TT) == typeof(long) && typeof(TS) == typeof(long) && scale == 1)
        {
            // The per-epoch merges of the workers' shares (wide into wide, weight 1): four buckets per
            // vector add. Same sums as the loop below (integer addition is exact).
            AddWide(
                MemoryMarshal.Cast<TT, long>(target.AsSpan(lo - targetOffset, hi - lo + 1)),
                MemoryMarshal.Cast<TS, long>(source.AsSpan(lo - sourceOffset, hi - lo + 1)));
            return;
        }

        TT s = TT.CreateTruncating(scale);
        for (int key = lo; key <= hi; key++)
        {
            target[key - targetOffset] += TT.CreateTruncating(source[key - sourceOffset]) * s;
        }
    }

    private static void AddWide(Span<long> target, ReadOnlySpan<long> source)
    {
        int i = 0;
        if (Vector256.IsHardwareAccelerated)
        {
            ref long t = ref MemoryMarshal.GetReference(target);
            ref long u = ref MemoryMarshal.GetReference(source);
            for (; i + 4 <= target.Length; i += 4)
            {
                (Vector256.LoadUnsafe(ref t, (nuint)i) + Vector256.LoadUnsafe(ref u, (nuint)i)).StoreUnsafe(ref t, (nuint)i);
            }
        }

        for (; i < target.Length; i++)
        {
            target[i] += source[i];
        }
    }

    /// <summary>The rare slow path of <see cref="AddKey"/>, kept out of line so the hot path inlines.</summary>
    [MethodImpl(MethodImplOptions.NoInlining)]
    private int GrowFor(int key)
    {
        EnsureRange(key, key);
        return key - offset;
    }

    /// <summary>
    /// Makes keys lo..hi addressable. The new store contains the old one and is at least 9/8 as long,
    /// so growth is amortised O(1) per key (all copies together move at most 9 times the final
    /// length); it stays below 1.5 times the range of keys ever added plus <see cref="InitialBuckets"/>.
    /// </summary>
    private void EnsureRange(int lo, int hi)
    {
        int oldLength = AllocatedBuckets;
        long oldLo = offset;
        long oldHi = (long)offset + oldLength - 1;
        if (lo >= oldLo && hi <= oldHi)
        {
            return;
        }

        bool first = oldLength == 0;
        long needLo = first ? lo : Math.Min(lo, oldLo);
        long needHi = first ? hi : Math.Max(hi, oldHi);
        long needed = needHi - needLo + 1;
        // Grow by an eighth of what is needed, not by doubling or a quarter: a grid of many cells holds
        // one store per cell and sketch, and doubling left them ~2.7x larger than their key range
        // (issue 6, memory). Growth is still geometric (needed contains the old store, so the new one is
        // at least 9/8 of the old), which keeps the copies amortised O(1) per key.
        long length = Math.Max(needed + (needed / 8), Math.Max(oldLength + (oldLength / 8), InitialBuckets));
        long slack = length - needed;

        // Spare room: three quarters on the side that grew (growth tends to continue that way), a
        // quarter on the other (tails grow both ways).
        long newOffset = first ? needLo - slack / 2
            : lo < oldLo ? needLo - (3 * slack / 4)
            : needLo - slack / 4;

        if (compact)
        {
            narrow = Regrow(narrow, (int)length, (int)newOffset);
        }
        else
        {
            wide = Regrow(wide, (int)length, (int)newOffset);
        }

        offset = (int)newOffset;
    }

    /// <summary>A store of the given length and offset holding the buckets minKey..maxKey of <paramref name="old"/>.</summary>
    private T[] Regrow<T>(T[] old, int length, int newOffset)
    {
        var grown = new T[length];
        if (minKey <= maxKey)
        {
            Array.Copy(old, minKey - offset, grown, minKey - newOffset, maxKey - minKey + 1);
        }

        return grown;
    }
}

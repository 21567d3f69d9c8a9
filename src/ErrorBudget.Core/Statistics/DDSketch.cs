using System.Runtime.InteropServices;
using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Statistics;

/// <summary>
/// A mergeable quantile sketch with relative accuracy alpha for non-negative values (error
/// magnitudes in metres, DOPs): DDSketch, Masson, Rim &amp; Lee, PVLDB 12(12):2195-2205, 2019.
/// </summary>
/// <remarks>
/// <para>Value x &gt; <see cref="MinIndexable"/> goes to bucket k = ceil(log_gamma x), covering
/// (gamma^(k-1), gamma^k] with gamma = (1 + alpha) / (1 - alpha); the bucket's estimate
/// 2 gamma^k / (gamma + 1) is within relative error alpha of every value in it. Values in
/// [0, MinIndexable] go to a zero counter and are estimated as 0.</para>
/// <para>Counts are integer weights, so merging is exact, associative and commutative: any merge
/// order of any split of the samples gives identical buckets and quantiles.</para>
/// <para>Memory: a dense store of 8 bytes per bucket between the lowest and highest key seen
/// (grown by amortised doubling, so up to about three times that). The range is ln(max/min) / (2 alpha)
/// buckets, e.g. ~1400 buckets (11 kB) for values from 1 mm to 1 km at alpha = 0.005. No bucket
/// cap: no accuracy is ever given up.</para>
/// <para>Not thread-safe: one sketch per worker, merged at the end.</para>
/// </remarks>
public sealed partial class DDSketch
{
    /// <summary>Values at or below this (and exact zeros) are counted in the zero bucket.</summary>
    public const double MinIndexable = 1e-9;

    /// <summary>The key of the zero bucket, as returned by <see cref="KeyOf"/> and taken by <see cref="AddKey"/>.</summary>
    public const int ZeroKey = int.MinValue;

    private readonly double inverseLnGamma;
    private readonly double lnGamma;
    private readonly double estimateFactor;

    /// <summary>Creates an empty sketch. Range: 1e-6 &lt;= relativeAccuracy &lt;= 0.5.</summary>
    public DDSketch(double relativeAccuracy = 0.005)
    {
        if (!(relativeAccuracy >= 1e-6 && relativeAccuracy <= 0.5))
        {
            throw new ArgumentOutOfRangeException(nameof(relativeAccuracy), relativeAccuracy, "Must be in [1e-6, 0.5].");
        }

        RelativeAccuracy = relativeAccuracy;
        Gamma = (1.0 + relativeAccuracy) / (1.0 - relativeAccuracy);
        lnGamma = Math.Log(Gamma);
        inverseLnGamma = 1.0 / lnGamma;
        estimateFactor = 2.0 / (Gamma + 1.0);
    }

    /// <summary>The relative accuracy alpha: every quantile is within alpha * |exact| of the exact one.</summary>
    public double RelativeAccuracy { get; }

    /// <summary>The bucket ratio gamma = (1 + alpha) / (1 - alpha).</summary>
    public double Gamma { get; }

    /// <summary>The total weight added.</summary>
    public long Count => count;

    /// <summary>True when no weight has been added.</summary>
    public bool IsEmpty => count == 0;

    /// <summary>
    /// The bucket key ceil(ln x / ln gamma) of a value, or <see cref="ZeroKey"/> for x &lt;= MinIndexable.
    /// Range: x finite and not NaN (not checked).
    /// </summary>
    /// <summary>
    /// Adds the same weight to the buckets of many keys (as <see cref="AddKey"/> for each): the store's
    /// fields stay in registers for the whole span, which is what makes the hot loop's inserts cheap.
    /// </summary>
    public void AddKeys(ReadOnlySpan<int> keys, long weight)
    {
        ScanKeys(keys, out int lo, out int hi, out long zeros);
        if (lo <= hi)
        {
            ReserveKeys(lo, hi);
            ref long bucket0 = ref MemoryMarshal.GetArrayDataReference(counts);
            int shift = offset;
            foreach (int key in keys)
            {
                if (key != ZeroKey)
                {
                    Unsafe.Add(ref bucket0, key - shift) += weight;
                }
            }
        }

        AddTotals(keys.Length, zeros, weight);
    }

    /// <summary>
    /// Adds the same keys to two sketches with their own weights, in one pass (as <see cref="AddKeys"/>
    /// on each): the hot loop's cell sketch (weight 1) and epoch share (area weight) see the same samples.
    /// </summary>
    public static void AddKeysToBoth(ReadOnlySpan<int> keys, DDSketch first, long firstWeight, DDSketch second, long secondWeight)
    {
        ArgumentNullException.ThrowIfNull(first);
        ArgumentNullException.ThrowIfNull(second);
        ScanKeys(keys, out int lo, out int hi, out long zeros);
        if (lo <= hi)
        {
            first.ReserveKeys(lo, hi);
            second.ReserveKeys(lo, hi);
            ref long a0 = ref MemoryMarshal.GetArrayDataReference(first.counts);
            ref long b0 = ref MemoryMarshal.GetArrayDataReference(second.counts);
            int aShift = first.offset, bShift = second.offset;
            foreach (int key in keys)
            {
                if (key != ZeroKey)
                {
                    Unsafe.Add(ref a0, key - aShift) += firstWeight;
                    Unsafe.Add(ref b0, key - bShift) += secondWeight;
                }
            }
        }

        first.AddTotals(keys.Length, zeros, firstWeight);
        second.AddTotals(keys.Length, zeros, secondWeight);
    }

    /// <summary>Lowest and highest non-zero key of a span (empty: lo &gt; hi) and how many zero keys it holds.</summary>
    /// <summary>
    /// Adds every key to <paramref name="first"/> (weight <paramref name="firstWeight"/>) and to
    /// <paramref name="all"/> (weight <paramref name="allWeight"/>), and the keys of segment g
    /// (keys [ends[g-1], ends[g]), ends[-1] = 0) to <paramref name="segments"/>[g] with
    /// <paramref name="allWeight"/>: one scan of the keys and one range reservation per sketch, then
    /// plain increments. Splits an epoch's samples into trial batches without a second pass.
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

        ScanKeys(keys, out int lo, out int hi, out long zeros);
        if (lo <= hi)
        {
            first.ReserveKeys(lo, hi);
            all.ReserveKeys(lo, hi);
        }

        ref long a0 = ref MemoryMarshal.GetArrayDataReference(first.counts);
        ref long c0 = ref MemoryMarshal.GetArrayDataReference(all.counts);
        int aShift = first.offset, cShift = all.offset;
        int start = 0;
        for (int g = 0; g < segments.Length; g++)
        {
            DDSketch second = segments[g];
            ReadOnlySpan<int> segment = keys[start..ends[g]];
            start = ends[g];
            if (lo <= hi)
            {
                second.ReserveKeys(lo, hi);
            }

            ref long b0 = ref MemoryMarshal.GetArrayDataReference(second.counts);
            int bShift = second.offset;
            long segmentZeros = 0;
            foreach (int key in segment)
            {
                if (key != ZeroKey)
                {
                    Unsafe.Add(ref a0, key - aShift) += firstWeight;
                    Unsafe.Add(ref b0, key - bShift) += allWeight;
                    Unsafe.Add(ref c0, key - cShift) += allWeight;
                }
                else
                {
                    segmentZeros++;
                }
            }

            second.AddTotals(segment.Length, segmentZeros, allWeight);
        }

        first.AddTotals(keys.Length, zeros, firstWeight);
        all.AddTotals(keys.Length, zeros, allWeight);
    }

    private static void ScanKeys(ReadOnlySpan<int> keys, out int lo, out int hi, out long zeros)
    {
        lo = int.MaxValue;
        hi = int.MinValue;
        zeros = 0;
        foreach (int key in keys)
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

    /// <summary>The rare slow path of <see cref="AddKey"/>, kept out of line so the hot path inlines.</summary>
    [MethodImpl(MethodImplOptions.NoInlining)]
    private int GrowFor(int key)
    {
        EnsureRange(key, key);
        return key - offset;
    }

    /// <summary>1 / ln gamma, for callers that compute keys in vector form (same formula as <see cref="KeyOf"/>).</summary>
    internal double InverseLnGamma => inverseLnGamma;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public int KeyOf(double value) =>
        value > MinIndexable ? (int)Math.Ceiling(Math.Log(value) * inverseLnGamma) : ZeroKey;

    /// <summary>
    /// Adds a value with an integer weight. Range: 0 &lt;= value &lt; infinity, weight &gt;= 0;
    /// otherwise <see cref="ArgumentOutOfRangeException"/>.
    /// </summary>
    public void Add(double value, long weight = 1)
    {
        if (!(value >= 0.0) || double.IsPositiveInfinity(value))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, "Must be finite and non-negative.");
        }

        if (weight < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(weight), weight, "Must be non-negative.");
        }

        AddKey(KeyOf(value), weight);
    }

    /// <summary>
    /// Adds a weight to a bucket by key (hot path, no checks; <see cref="ZeroKey"/> is the zero bucket).
    /// Allocates only when the key lies outside the range allocated so far.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void AddKey(int key, long weight)
    {
        count += weight;
        if (key == ZeroKey)
        {
            zeroCount += weight;
            return;
        }

        int i = key - offset;
        if ((uint)i >= (uint)counts.Length)
        {
            i = GrowFor(key);
        }

        counts[i] += weight;
        if (key < minKey)
        {
            minKey = key;
        }

        if (key > maxKey)
        {
            maxKey = key;
        }
    }

    /// <summary>
    /// The q-quantile estimate, NaN when empty. Rank convention: the first bucket (zero bucket first)
    /// whose cumulative weight reaches max(1, ceil(q n)), so the result is within relative error
    /// alpha of the exact sample quantile x_(ceil(q n)) (1-based, sorted ascending), as given by
    /// <see cref="ExactQuantile.Of"/>. Range: q in [0, 1].
    /// </summary>
    public double Quantile(double q)
    {
        if (count == 0)
        {
            if (!(q >= 0.0 && q <= 1.0))
            {
                throw new ArgumentOutOfRangeException(nameof(q), q, "The quantile level must be in [0, 1].");
            }

            return double.NaN;
        }

        long target = QuantileRank.Target(q, count);
        long cumulative = zeroCount;
        if (cumulative >= target)
        {
            return 0.0;
        }

        for (int key = minKey; key <= maxKey; key++)
        {
            cumulative += counts[key - offset];
            if (cumulative >= target)
            {
                return Estimate(key);
            }
        }

        return Estimate(maxKey); // reached only if weights were added with negative values
    }

    /// <summary>The estimate 2 gamma^k / (gamma + 1) of bucket k (0 for the zero bucket).</summary>
    internal double Estimate(int key) => key == ZeroKey ? 0.0 : estimateFactor * Math.Exp(key * lnGamma);
}

using System.Numerics;
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
/// <para>Memory: a dense store of 8 bytes per bucket (4 with compact counts, see below) between the
/// lowest and highest key seen, grown geometrically by an eighth, so up to 1.5 times that range plus
/// 64 buckets. The range is ln(max/min) / (2 alpha) buckets, e.g. ~1400 buckets (11 kB, or 5.5 kB
/// compact) for values from 1 mm to 1 km at alpha = 0.005. No bucket cap: no accuracy is ever given up.</para>
/// <para>Compact counts (opt-in, for the many small per-cell sketches of a grid): buckets are 32-bit
/// until the total weight would pass <see cref="uint.MaxValue"/>; the sketch widens itself to 64-bit
/// buckets (a copy) before any add or merge that could take it there. No bucket exceeds the total,
/// so no bucket can overflow. Widening depends only on the total weight and only copies counts, so
/// buckets, <see cref="Count"/> and quantiles are identical to those of a wide sketch fed the same
/// weights, in any order of adds and merges. A negative weight also widens (a 32-bit bucket cannot
/// go below zero).</para>
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

    /// <summary>
    /// Creates an empty sketch. Range: 1e-6 &lt;= relativeAccuracy &lt;= 0.5. With
    /// <paramref name="compactCounts"/> the buckets take 4 bytes instead of 8 until the total weight
    /// passes <see cref="uint.MaxValue"/> (then the sketch widens itself; results are the same).
    /// </summary>
    public DDSketch(double relativeAccuracy = 0.005, bool compactCounts = false)
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
        compact = compactCounts;
    }

    /// <summary>The relative accuracy alpha: every quantile is within alpha * |exact| of the exact one.</summary>
    public double RelativeAccuracy { get; }

    /// <summary>The bucket ratio gamma = (1 + alpha) / (1 - alpha).</summary>
    public double Gamma { get; }

    /// <summary>The total weight added.</summary>
    public long Count => count;

    /// <summary>True when no weight has been added.</summary>
    public bool IsEmpty => count == 0;

    /// <summary>1 / ln gamma, for callers that compute keys in vector form (same formula as <see cref="KeyOf"/>).</summary>
    internal double InverseLnGamma => inverseLnGamma;

    /// <summary>
    /// The bucket key ceil(ln x / ln gamma) of a value, or <see cref="ZeroKey"/> for x &lt;= MinIndexable.
    /// Range: x finite and not NaN (not checked).
    /// </summary>
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
    /// Allocates only when the key lies outside the range allocated so far (or a compact store widens).
    /// Range: weight &gt;= 0.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void AddKey(int key, long weight)
    {
        // While compact, count <= uint.MaxValue, so the right side does not wrap; a negative weight
        // is a huge ulong and widens too.
        if (compact && (ulong)weight > uint.MaxValue - (ulong)count)
        {
            Widen();
        }

        count += weight;
        if (key == ZeroKey)
        {
            zeroCount += weight;
            return;
        }

        int i = key - offset;
        if ((uint)i >= (uint)AllocatedBuckets)
        {
            i = GrowFor(key);
        }

        if (compact)
        {
            narrow[i] += (uint)weight;
        }
        else
        {
            wide[i] += weight;
        }

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
        if (zeroCount >= target)
        {
            return 0.0;
        }

        return Estimate(compact
            ? KeyReaching(narrow, offset, minKey, maxKey, zeroCount, target)
            : KeyReaching(wide, offset, minKey, maxKey, zeroCount, target));
    }

    /// <summary>The estimate 2 gamma^k / (gamma + 1) of bucket k (0 for the zero bucket).</summary>
    internal double Estimate(int key) => key == ZeroKey ? 0.0 : estimateFactor * Math.Exp(key * lnGamma);

    /// <summary>The first key in [minKey, maxKey] whose cumulative weight (from <paramref name="cumulative"/>) reaches target.</summary>
    private static int KeyReaching<T>(T[] counts, int offset, int minKey, int maxKey, long cumulative, long target)
        where T : unmanaged, IBinaryInteger<T>
    {
        for (int key = minKey; key <= maxKey; key++)
        {
            cumulative += long.CreateTruncating(counts[key - offset]);
            if (cumulative >= target)
            {
                return key;
            }
        }

        return maxKey; // reached only if weights were added with negative values
    }
}

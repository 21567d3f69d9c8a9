using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Integrity;

/// <summary>
/// A mergeable histogram of normalized range errors x = e / sigma_assumed (dimensionless), the input of
/// the overbounding check <see cref="OverboundAnalysis.RequiredInflation"/>.
/// </summary>
/// <remarks>
/// <para><b>Bins.</b> BinCount linear bins of width w from L = -HalfRange: bin i covers
/// [Edge(i), Edge(i + 1)) with Edge(i) = L + i w (the double so computed). A value exactly on an edge
/// goes to the upper bin. x &lt; Edge(0) is counted in <see cref="Underflow"/>, x &gt;= Edge(BinCount)
/// in <see cref="Overflow"/>. The default w = 1/64 (about 0.016) is a power of two, so every edge,
/// 0 among them, is an exact double and the edges are exact mirrors of each other.</para>
/// <para><b>Moments.</b> Sum x and sum x^2 are kept as 128-bit fixed-point integers (each term rounded to
/// a multiple of 2^-40, 9.1e-13): merging adds integers, so any split of the samples and any merge order
/// give the same bits, and the moments use the exact values, not the bin centres. Resolution of the
/// variance about 1e-12 / sigma^2 relative; capacity sum x^2 &lt; 1.5e26 (e.g. 1e20 samples of unit size).</para>
/// <para>Counts are long integers, so <see cref="Merge"/> is exact, associative and commutative.
/// Not thread-safe: one histogram per worker, merged at the end. Adding allocates nothing.</para>
/// </remarks>
internal sealed class OverboundHistogram
{
    /// <summary>The largest |x| accepted: keeps one term of sum x^2 far inside the fixed-point range.</summary>
    public const double MaxMagnitude = 1e9;

    private const double FixedScale = 1099511627776.0; // 2^40

    private readonly long[] counts;
    private readonly double inverseWidth;
    private long underflow;
    private long overflow;
    private long count;
    private Int128 sumX;
    private Int128 sumX2;

    /// <summary>
    /// An empty histogram over [-halfRange, halfRange) in bins of width binWidth.
    /// Range: 0 &lt; binWidth, 2 halfRange / binWidth an integer (to 1e-9) between 2 and 10^6.
    /// </summary>
    public OverboundHistogram(double halfRange = 12.0, double binWidth = 1.0 / 64.0)
    {
        double bins = 2.0 * halfRange / binWidth;
        if (!(binWidth > 0.0) || !(halfRange > 0.0) || !(bins >= 2.0 && bins <= 1e6) || Math.Abs(bins - Math.Round(bins)) > 1e-9 * bins)
        {
            throw new ArgumentOutOfRangeException(nameof(binWidth), binWidth, $"2 * halfRange / binWidth must be an integer in [2, 1e6] (halfRange {halfRange}).");
        }

        HalfRange = halfRange;
        BinWidth = binWidth;
        LowerEdge = -halfRange;
        inverseWidth = 1.0 / binWidth;
        counts = new long[(int)Math.Round(bins)];
    }

    /// <summary>Half the width of the binned range, in sigma units.</summary>
    public double HalfRange { get; }

    /// <summary>The bin width w, in sigma units.</summary>
    public double BinWidth { get; }

    /// <summary>Edge(0) = -HalfRange.</summary>
    public double LowerEdge { get; }

    /// <summary>The number of regular bins (underflow and overflow not included).</summary>
    public int BinCount => counts.Length;

    /// <summary>All samples added, underflow and overflow included.</summary>
    public long Count => count;

    /// <summary>Samples below Edge(0).</summary>
    public long Underflow => underflow;

    /// <summary>Samples at or above Edge(BinCount).</summary>
    public long Overflow => overflow;

    /// <summary>The sample mean of x (exact sums, not bin centres); NaN when empty.</summary>
    public double Mean => count == 0 ? double.NaN : (double)sumX / FixedScale / count;

    /// <summary>
    /// The sample standard deviation of x with divisor n - 1 (exact sums, not bin centres); NaN for n &lt; 2.
    /// </summary>
    public double StandardDeviation
    {
        get
        {
            if (count < 2)
            {
                return double.NaN;
            }

            // n * sum x^2 - (sum x)^2 in integers (scaled by 2^80) would overflow Int128; the double form
            // loses only ~1e-16 relative of sum x^2, far below the 2^-40 term rounding for |mean| ~ sigma.
            double sx = (double)sumX / FixedScale;
            double sxx = (double)sumX2 / FixedScale;
            double centred = sxx - sx * sx / count;
            return Math.Sqrt(Math.Max(centred, 0.0) / (count - 1));
        }
    }

    /// <summary>Edge(i) = LowerEdge + i w. Range: 0 &lt;= i &lt;= BinCount.</summary>
    public double Edge(int i) => LowerEdge + i * BinWidth;

    /// <summary>The count of regular bin i, covering [Edge(i), Edge(i + 1)). Range: 0 &lt;= i &lt; BinCount.</summary>
    public long CountOf(int bin) => counts[bin];

    /// <summary>
    /// The bin of x: -1 for underflow, BinCount for overflow, else i with Edge(i) &lt;= x &lt; Edge(i + 1).
    /// Range: x not NaN.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public int BinOf(double x)
    {
        int n = counts.Length;
        if (x < LowerEdge)
        {
            return -1;
        }

        if (x >= Edge(n))
        {
            return n;
        }

        // The product may round across an edge; one step each way restores Edge(i) <= x < Edge(i + 1).
        int i = Math.Clamp((int)((x - LowerEdge) * inverseWidth), 0, n - 1);
        if (x < Edge(i))
        {
            i--;
        }
        else if (x >= Edge(i + 1))
        {
            i++;
        }

        return i;
    }

    /// <summary>Adds one sample. Range: |x| &lt;= <see cref="MaxMagnitude"/> (NaN rejected), else <see cref="ArgumentOutOfRangeException"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Add(double x)
    {
        if (!(Math.Abs(x) <= MaxMagnitude))
        {
            Throw(x);
        }

        int i = BinOf(x);
        if ((uint)i < (uint)counts.Length)
        {
            counts[i]++;
        }
        else if (i < 0)
        {
            underflow++;
        }
        else
        {
            overflow++;
        }

        count++;
        sumX += (Int128)Math.Round(x * FixedScale);
        sumX2 += (Int128)Math.Round(x * x * FixedScale);
    }

    /// <summary>Adds every sample of the span (as <see cref="Add"/> for each).</summary>
    public void AddMany(ReadOnlySpan<double> xs)
    {
        foreach (double x in xs)
        {
            Add(x);
        }
    }

    /// <summary>Adds the counts and sums of another histogram of the same layout (else <see cref="ArgumentException"/>).</summary>
    public void Merge(OverboundHistogram other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (other.HalfRange != HalfRange || other.BinWidth != BinWidth)
        {
            throw new ArgumentException(
                $"Layouts differ: half range {other.HalfRange} vs {HalfRange}, bin width {other.BinWidth} vs {BinWidth}.", nameof(other));
        }

        for (int i = 0; i < counts.Length; i++)
        {
            counts[i] += other.counts[i];
        }

        underflow += other.underflow;
        overflow += other.overflow;
        count += other.count;
        sumX += other.sumX;
        sumX2 += other.sumX2;
    }

    /// <summary>Removes every sample; the layout stays.</summary>
    public void Clear()
    {
        Array.Clear(counts);
        underflow = 0;
        overflow = 0;
        count = 0;
        sumX = 0;
        sumX2 = 0;
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void Throw(double x) =>
        throw new ArgumentOutOfRangeException(nameof(x), x, $"A normalized error must satisfy |x| <= {MaxMagnitude}.");
}

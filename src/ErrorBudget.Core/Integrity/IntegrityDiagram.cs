using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Integrity;

/// <summary>
/// The integrity (Stanford-style) diagram of one axis: a 2-D histogram of (protection level, position error)
/// in metres, on one log-spaced bin layout shared by both coordinates.
/// </summary>
/// <remarks>
/// <para><b>Bins.</b> R = BinsPerDecade log10(MaxMeters / MinMeters) regular bins with edges
/// E_k = MinMeters 10^(k / BinsPerDecade), k = 0..R (E_0 = MinMeters and E_R = MaxMeters exactly; for the default 0.01 m the
/// decade edges 0.1, 1, 10, 100, 1000 m come out exact too, as tested). Indexing: bin 0 = underflow
/// [0, MinMeters) (negative values and 0 included); bin j = 1..R = [E_(j-1), E_j); bin R + 1 = overflow
/// [MaxMeters, infinity). A value exactly on an edge goes to the upper bin. Example: MinMeters 0.01,
/// 20 bins per decade: 1.0 m is E_40, the lower edge of regular bin 40 (0-based), which is diagram bin 41.</para>
/// <para><b>Speed.</b> <see cref="BinOf"/> takes no logarithm: log2 from the bits of the double (exponent plus
/// linear mantissa, within 0.043 of log2 after centring) gives a guess within 0.013 BinsPerDecade bins
/// (under one bin up to 77 per decade); stepping against the stored edges, one comparison each way in
/// the common case, makes it exact.</para>
/// <para>Counts are long integers in one dense array of (R + 2)^2 cells (122^2 = 15 k cells, 119 kB, for the
/// default 0.01 m to 10 km at 20 per decade), so <see cref="Merge"/> is exact, associative and commutative.
/// Not thread-safe: one diagram per worker, merged at the end. Adding allocates nothing.</para>
/// </remarks>
internal sealed class IntegrityDiagram
{
    /// <summary>The underflow bin [0, MinMeters).</summary>
    public const int UnderflowBin = 0;

    private const double Log10Of2 = 0.30102999566398120;
    private const double MantissaScale = 1.0 / 4503599627370496.0; // 2^-52
    private const double Log2Centring = 0.0430357; // half the largest log2(1 + f) - f (0.0861 at f = 1/ln 2 - 1): error +-0.043

    private readonly double[] edges; // E_0 .. E_R
    private readonly long[] cells;   // [plBin * BinCount + errorBin]
    private readonly double guessScale;
    private readonly double guessOffset;
    private long total;

    /// <summary>
    /// An empty diagram. Range: 1e-300 &lt;= minMeters &lt; maxMeters &lt; infinity; 1 &lt;= binsPerDecade &lt;= 1000;
    /// binsPerDecade log10(max / min) an integer (to 1e-9) of at most 4000.
    /// </summary>
    public IntegrityDiagram(IntegrityDiagramAxis axis, double minMeters = 0.01, double maxMeters = 1e4, int binsPerDecade = 20)
    {
        if (!(minMeters >= 1e-300 && maxMeters > minMeters && maxMeters < double.PositiveInfinity))
        {
            throw new ArgumentOutOfRangeException(nameof(maxMeters), maxMeters, $"Need 1e-300 <= minMeters ({minMeters}) < maxMeters < infinity.");
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(binsPerDecade, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(binsPerDecade, 1000);
        double regular = binsPerDecade * Math.Log10(maxMeters / minMeters);
        if (!(regular <= 4000.0) || Math.Abs(regular - Math.Round(regular)) > 1e-9 * regular)
        {
            throw new ArgumentOutOfRangeException(nameof(binsPerDecade), binsPerDecade,
                $"binsPerDecade * log10(maxMeters / minMeters) = {regular} must be an integer of at most 4000.");
        }

        Axis = axis;
        MinMeters = minMeters;
        MaxMeters = maxMeters;
        BinsPerDecade = binsPerDecade;
        RegularBinCount = (int)Math.Round(regular);
        edges = new double[RegularBinCount + 1];
        for (int k = 0; k < RegularBinCount; k++)
        {
            edges[k] = minMeters * Math.Pow(10.0, (double)k / binsPerDecade);
        }

        edges[0] = minMeters;
        edges[RegularBinCount] = maxMeters;
        cells = new long[BinCount * BinCount];
        guessScale = binsPerDecade * Log10Of2;
        guessOffset = Math.Log2(minMeters) - Log2Centring;
    }

    /// <summary>The axis the diagram describes.</summary>
    public IntegrityDiagramAxis Axis { get; }

    /// <summary>The lower edge of the regular range, in metres.</summary>
    public double MinMeters { get; }

    /// <summary>The upper edge of the regular range, in metres.</summary>
    public double MaxMeters { get; }

    /// <summary>Regular bins per decade.</summary>
    public int BinsPerDecade { get; }

    /// <summary>R, the number of regular bins.</summary>
    public int RegularBinCount { get; }

    /// <summary>R + 2: underflow, the regular bins, overflow.</summary>
    public int BinCount => RegularBinCount + 2;

    /// <summary>The overflow bin [MaxMeters, infinity), R + 1.</summary>
    public int OverflowBin => RegularBinCount + 1;

    /// <summary>The number of samples added.</summary>
    public long Total => total;

    /// <summary>The diagram bin of 0-based regular bin r: r + 1. Range: 0 &lt;= r &lt; R.</summary>
    public static int RegularBin(int r) => r + 1;

    /// <summary>The lower edge of a bin in metres (0 for the underflow bin). Range: 0 &lt;= bin &lt; BinCount.</summary>
    public double LowerEdge(int bin)
    {
        CheckBin(bin, nameof(bin));
        return bin == UnderflowBin ? 0.0 : edges[bin - 1];
    }

    /// <summary>The upper edge of a bin in metres (+infinity for the overflow bin). Range: 0 &lt;= bin &lt; BinCount.</summary>
    public double UpperEdge(int bin)
    {
        CheckBin(bin, nameof(bin));
        return bin == OverflowBin ? double.PositiveInfinity : edges[bin];
    }

    /// <summary>
    /// The bin of a length in metres: LowerEdge(bin) &lt;= meters &lt; UpperEdge(bin), values below MinMeters
    /// (0 and negatives included) in the underflow bin. Range: not NaN, else <see cref="ArgumentOutOfRangeException"/>.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public int BinOf(double meters)
    {
        if (!(meters >= MinMeters))
        {
            return double.IsNaN(meters) ? ThrowNaN() : UnderflowBin;
        }

        if (meters >= MaxMeters)
        {
            return OverflowBin;
        }

        // log2(m) ~ bits 2^-52 - 1023 (exponent plus linear mantissa); then exact against the stored edges.
        double log2 = BitConverter.DoubleToInt64Bits(meters) * MantissaScale - 1023.0;
        int r = Math.Clamp((int)((log2 - guessOffset) * guessScale), 0, RegularBinCount - 1);
        while (meters < edges[r])
        {
            r--;
        }

        while (meters >= edges[r + 1])
        {
            r++;
        }

        return r + 1;
    }

    /// <summary>bins[i] = BinOf(meters[i]). Range: equal lengths.</summary>
    public void BinsOf(ReadOnlySpan<double> meters, Span<int> bins)
    {
        if (bins.Length != meters.Length)
        {
            throw new ArgumentException($"Lengths differ: {meters.Length} values, {bins.Length} bins.", nameof(bins));
        }

        for (int i = 0; i < meters.Length; i++)
        {
            bins[i] = BinOf(meters[i]);
        }
    }

    /// <summary>The count of one cell. Range: both bins in [0, BinCount).</summary>
    public long CountOf(int plBin, int errorBin)
    {
        CheckBin(plBin, nameof(plBin));
        CheckBin(errorBin, nameof(errorBin));
        return cells[plBin * BinCount + errorBin];
    }

    /// <summary>Adds count samples to one cell. Range: both bins in [0, BinCount); count &gt;= 0.</summary>
    public void Add(int plBin, int errorBin, long count = 1)
    {
        CheckBin(plBin, nameof(plBin));
        CheckBin(errorBin, nameof(errorBin));
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        cells[plBin * BinCount + errorBin] += count;
        total += count;
    }

    /// <summary>
    /// Adds one sample per error bin to the row of one protection-level bin (the hot path: one call per
    /// user-epoch with the error bins of all its trials). Range: plBin in [0, BinCount); an error bin outside
    /// [0, BinCount) is a programming error (bins come from <see cref="BinOf"/>): it throws
    /// <see cref="IndexOutOfRangeException"/> with the earlier bins of the span already counted.
    /// </summary>
    public void AddErrorBins(int plBin, ReadOnlySpan<int> errorBins)
    {
        CheckBin(plBin, nameof(plBin));
        Span<long> row = cells.AsSpan(plBin * BinCount, BinCount);
        foreach (int e in errorBins)
        {
            row[e]++; // the span's bounds check is the only check
        }

        total += errorBins.Length;
    }

    /// <summary>Adds the cells of a diagram of the same axis and layout (else <see cref="ArgumentException"/>).</summary>
    public void Merge(IntegrityDiagram other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (other.Axis != Axis || other.MinMeters != MinMeters || other.MaxMeters != MaxMeters || other.BinsPerDecade != BinsPerDecade)
        {
            throw new ArgumentException(
                $"Layouts differ: {other.Axis} {other.MinMeters}-{other.MaxMeters} m at {other.BinsPerDecade}/decade vs "
                + $"{Axis} {MinMeters}-{MaxMeters} m at {BinsPerDecade}/decade.", nameof(other));
        }

        for (int i = 0; i < cells.Length; i++)
        {
            cells[i] += other.cells[i];
        }

        total += other.total;
    }

    /// <summary>Removes every sample; the layout stays.</summary>
    public void Clear()
    {
        Array.Clear(cells);
        total = 0;
    }

    /// <summary>The non-empty cells in a fixed order: protection-level bin ascending, then error bin ascending.</summary>
    public IEnumerable<IntegrityDiagramCell> NonEmptyCells()
    {
        int n = BinCount;
        for (int i = 0; i < cells.Length; i++)
        {
            if (cells[i] != 0)
            {
                yield return new IntegrityDiagramCell(i / n, i % n, cells[i]);
            }
        }
    }

    private void CheckBin(int bin, string name)
    {
        if ((uint)bin >= (uint)BinCount)
        {
            throw new ArgumentOutOfRangeException(name, bin, $"A bin must be in [0, {BinCount}).");
        }
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static int ThrowNaN() => throw new ArgumentOutOfRangeException("meters", double.NaN, "A length in metres must not be NaN.");
}

using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Integrity;

public class OverboundHistogramTests
{
    // Moments come from 2^-40 fixed-point sums: per-term rounding 4.5e-13, so 1e-9 relative is ample
    // against a plain double reference (whose own summation error is ~1e-13 for these sizes).
    private const double MomentTolerance = 1e-9;

    private static double[] Normals(long stream, int n, double sigma = 1.0, double bias = 0.0)
    {
        var x = new double[n];
        CounterRng.FillNormals(CounterRng.Key(20_000, RandomPurpose.Spare, stream, 0, 0), 0, x);
        for (int i = 0; i < n; i++)
        {
            x[i] = bias + sigma * x[i];
        }

        return x;
    }

    private static OverboundHistogram Of(ReadOnlySpan<double> xs)
    {
        var h = new OverboundHistogram();
        h.AddMany(xs);
        return h;
    }

    [Fact]
    public void Default_layout_has_power_of_two_bins_with_exact_edges_at_zero_and_the_range_ends()
    {
        var h = new OverboundHistogram();
        Assert.Equal(1536, h.BinCount); // 24 sigma / (1/64)
        Assert.Equal(-12.0, h.Edge(0));
        Assert.Equal(0.0, h.Edge(768));
        Assert.Equal(12.0, h.Edge(1536));
        Assert.Equal(-h.Edge(100), h.Edge(1536 - 100)); // exact mirrors
    }

    [Fact]
    public void A_value_on_an_edge_goes_to_the_upper_bin_and_every_value_lies_inside_its_bin()
    {
        var h = new OverboundHistogram(halfRange: 3.0, binWidth: 0.02); // 0.02 is not a double: edges are rounded
        Assert.Equal(-1, h.BinOf(-3.0000001));
        Assert.Equal(0, h.BinOf(-3.0));
        Assert.Equal(h.BinCount, h.BinOf(h.Edge(h.BinCount)));
        for (int i = 0; i < h.BinCount; i++)
        {
            double edge = h.Edge(i);
            Assert.Equal(i, h.BinOf(edge));
            Assert.Equal(i - 1, h.BinOf(Math.BitDecrement(edge)));
        }

        ulong key = CounterRng.Key(20_001, RandomPurpose.Spare, 0, 0, 0);
        for (ulong j = 0; j < 10_000; j++)
        {
            double x = -3.5 + 7.0 * CounterRng.Uniform(key, j);
            int bin = h.BinOf(x);
            bool inside = bin == -1 ? x < h.Edge(0)
                : bin == h.BinCount ? x >= h.Edge(bin)
                : h.Edge(bin) <= x && x < h.Edge(bin + 1);
            Assert.True(inside, $"x = {x:R} in bin {bin}");
        }
    }

    [Fact]
    public void Counts_land_in_underflow_overflow_and_bins_and_sum_to_the_count()
    {
        var h = new OverboundHistogram(halfRange: 1.0, binWidth: 0.5);
        h.AddMany([-5.0, -1.0, -0.5, -0.1, 0.0, 0.49, 0.5, 1.0, 7.0]);
        Assert.Equal(1, h.Underflow);  // -5
        Assert.Equal(2, h.Overflow);   // 1.0 is the top edge: upper side; 7
        Assert.Equal(1, h.CountOf(0)); // -1
        Assert.Equal(2, h.CountOf(1)); // -0.5, -0.1
        Assert.Equal(2, h.CountOf(2)); // 0, 0.49
        Assert.Equal(1, h.CountOf(3)); // 0.5
        Assert.Equal(9, h.Count);
    }

    [Fact]
    public void Mean_and_standard_deviation_equal_the_direct_sample_moments()
    {
        double[] x = Normals(1, 100_000, sigma: 1.7, bias: 0.3);
        double mean = x.Average();
        double sd = Math.Sqrt(x.Sum(v => (v - mean) * (v - mean)) / (x.Length - 1)); // divisor n - 1
        OverboundHistogram h = Of(x);
        Assert.Equal(mean, h.Mean, MomentTolerance);
        Assert.Equal(sd, h.StandardDeviation, MomentTolerance * sd);
    }

    [Fact]
    public void Merged_histograms_equal_the_histogram_of_the_union_bit_for_bit()
    {
        double[] a = Normals(2, 30_000);
        double[] b = Normals(3, 50_000, sigma: 4.0, bias: -1.0); // reaches the underflow and overflow
        OverboundHistogram merged = Of(a);
        merged.Merge(Of(b));
        OverboundHistogram union = Of(a.Concat(b).ToArray());
        Assert.True(union.Underflow > 0 && union.Overflow > 0);
        Assert.Equal(union.Count, merged.Count);
        Assert.Equal(union.Underflow, merged.Underflow);
        Assert.Equal(union.Overflow, merged.Overflow);
        for (int i = 0; i < union.BinCount; i++)
        {
            Assert.Equal(union.CountOf(i), merged.CountOf(i));
        }

        Assert.Equal(union.Mean, merged.Mean); // integer sums: exact, not merely close
        Assert.Equal(union.StandardDeviation, merged.StandardDeviation);
    }

    [Fact]
    public void Add_one_by_one_equals_AddMany()
    {
        double[] x = Normals(4, 5_000);
        var single = new OverboundHistogram();
        foreach (double v in x)
        {
            single.Add(v);
        }

        OverboundHistogram many = Of(x);
        for (int i = 0; i < many.BinCount; i++)
        {
            Assert.Equal(many.CountOf(i), single.CountOf(i));
        }

        Assert.Equal(many.Mean, single.Mean);
    }

    [Fact]
    public void Clear_empties_counts_and_moments()
    {
        OverboundHistogram h = Of(Normals(5, 1_000, sigma: 20.0));
        h.Clear();
        Assert.Equal(0, h.Count);
        Assert.Equal(0, h.Underflow);
        Assert.Equal(0, h.Overflow);
        Assert.True(Enumerable.Range(0, h.BinCount).All(i => h.CountOf(i) == 0));
        Assert.True(double.IsNaN(h.Mean));
        h.Add(2.0);
        Assert.Equal(2.0, h.Mean);
    }

    [Fact]
    public void Merge_of_different_layouts_and_NaN_or_huge_samples_are_rejected()
    {
        var h = new OverboundHistogram();
        Assert.Throws<ArgumentException>(() => h.Merge(new OverboundHistogram(binWidth: 1.0 / 32.0)));
        Assert.Throws<ArgumentOutOfRangeException>(() => h.Add(double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => h.Add(double.NegativeInfinity));
        Assert.Throws<ArgumentOutOfRangeException>(() => h.Add(2e9));
        Assert.Throws<ArgumentOutOfRangeException>(() => new OverboundHistogram(halfRange: 1.0, binWidth: 0.3));
        Assert.Equal(0, h.Count);
    }
}

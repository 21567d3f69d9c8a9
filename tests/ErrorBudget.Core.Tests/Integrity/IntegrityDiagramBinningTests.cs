using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Integrity;

public class IntegrityDiagramBinningTests
{
    // Edges are computed as min * 10^(k / B): one pow and one product, each within half an ulp, so 4 ulp
    // (~9e-16 relative) bounds their distance from the decimal formula evaluated here the other way.
    private const double EdgeRelativeTolerance = 1e-15;

    private static IntegrityDiagram Default() => new(IntegrityDiagramAxis.Vertical);

    [Fact]
    public void Default_layout_has_six_decades_of_twenty_bins_between_underflow_and_overflow()
    {
        IntegrityDiagram d = Default();
        Assert.Equal(120, d.RegularBinCount); // 20 * log10(1e4 / 0.01)
        Assert.Equal(122, d.BinCount);
        Assert.Equal(121, d.OverflowBin);
    }

    [Theory]
    [InlineData(1.0, 41)]          // E_40 = 0.01 * 10^(40/20): regular bin 40, diagram bin 41
    [InlineData(0.01, 1)]          // E_0 = MinMeters: the first regular bin
    [InlineData(0.0099, 0)]        // below MinMeters: underflow
    [InlineData(0.0, 0)]
    [InlineData(-3.0, 0)]
    [InlineData(0.1, 21)]          // one decade up: 20 bins later
    [InlineData(10.0, 61)]
    [InlineData(1.12, 41)]         // 1.12 < E_41 = 10^(1/20) = 1.1220
    [InlineData(1.1221, 42)]
    [InlineData(9999.999, 120)]    // the last regular bin
    [InlineData(1e4, 121)]         // MaxMeters itself: overflow
    [InlineData(double.PositiveInfinity, 121)]
    public void Hand_values_land_in_the_stated_bins(double meters, int bin)
    {
        Assert.Equal(bin, Default().BinOf(meters));
    }

    [Fact]
    public void Decade_edges_are_exact_and_every_edge_follows_the_decimal_formula()
    {
        IntegrityDiagram d = Default();
        double[] decades = [0.01, 0.1, 1.0, 10.0, 100.0, 1000.0, 10_000.0];
        for (int j = 0; j < decades.Length; j++)
        {
            Assert.Equal(decades[j], d.LowerEdge(IntegrityDiagram.RegularBin(20 * j))); // bit-exact
        }

        for (int k = 0; k <= d.RegularBinCount; k++)
        {
            double expected = Math.Pow(10.0, -2.0 + k / 20.0);
            Assert.Equal(expected, d.LowerEdge(k + 1), EdgeRelativeTolerance * expected);
        }

        Assert.Equal(0.0, d.LowerEdge(IntegrityDiagram.UnderflowBin));
        Assert.Equal(double.PositiveInfinity, d.UpperEdge(d.OverflowBin));
    }

    [Fact]
    public void Edges_round_trip_and_a_value_on_an_edge_goes_to_the_upper_bin()
    {
        IntegrityDiagram d = Default();
        for (int bin = 1; bin < d.BinCount; bin++)
        {
            double edge = d.LowerEdge(bin);
            Assert.Equal(d.UpperEdge(bin - 1), edge);
            Assert.Equal(bin, d.BinOf(edge));
            Assert.Equal(bin - 1, d.BinOf(Math.BitDecrement(edge)));
        }
    }

    [Theory]
    [InlineData(0.01, 1e4, 20)]
    [InlineData(0.01, 1e4, 1)]
    [InlineData(0.003, 3e3, 7)]
    [InlineData(1e-3, 1e1, 1000)] // the log2 guess is off by up to 13 bins here: the correction loops carry it
    public void BinOf_agrees_with_a_search_of_the_edges_for_log_uniform_values(double min, double max, int perDecade)
    {
        var d = new IntegrityDiagram(IntegrityDiagramAxis.Horizontal, min, max, perDecade);
        ulong key = CounterRng.Key(31, RandomPurpose.Spare, perDecade, 0, 0);
        for (ulong j = 0; j < 20_000; j++)
        {
            double meters = min * Math.Pow(max / min, -0.1 + 1.2 * CounterRng.Uniform(key, j)); // reaches past both ends
            Assert.Equal(SearchBin(d, meters), d.BinOf(meters));
        }
    }

    [Fact]
    public void BinsOf_a_span_equals_BinOf_each_value_and_NaN_is_rejected()
    {
        IntegrityDiagram d = Default();
        double[] meters = [0.0, 0.02, 3.7, 50.0, 2e4];
        var bins = new int[meters.Length];
        d.BinsOf(meters, bins);
        Assert.Equal(meters.Select(d.BinOf).ToArray(), bins);
        Assert.Throws<ArgumentOutOfRangeException>(() => d.BinOf(double.NaN));
        Assert.Throws<ArgumentException>(() => d.BinsOf(meters, new int[2]));
    }

    [Fact]
    public void Layouts_that_are_not_a_whole_number_of_bins_are_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new IntegrityDiagram(IntegrityDiagramAxis.Vertical, 0.01, 5e3, 20));
        Assert.Throws<ArgumentOutOfRangeException>(() => new IntegrityDiagram(IntegrityDiagramAxis.Vertical, 0.0, 1e4, 20));
        Assert.Throws<ArgumentOutOfRangeException>(() => new IntegrityDiagram(IntegrityDiagramAxis.Vertical, 1.0, 1.0, 20));
    }

    /// <summary>The bin by binary search of the lower edges (independent of the log2 guess).</summary>
    private static int SearchBin(IntegrityDiagram d, double meters)
    {
        int lo = 0, hi = d.BinCount - 1; // invariant: LowerEdge(lo) <= meters (LowerEdge(0) = 0 for meters >= 0)
        while (lo < hi)
        {
            int mid = (lo + hi + 1) / 2;
            if (d.LowerEdge(mid) <= meters)
            {
                lo = mid;
            }
            else
            {
                hi = mid - 1;
            }
        }

        return lo;
    }
}

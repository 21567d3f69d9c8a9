using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Statistics;

public class DDSketchZeroAndWeightTests
{
    [Fact]
    public void Zero_and_tiny_values_go_to_the_zero_bucket()
    {
        var sketch = new DDSketch();
        sketch.Add(0.0);
        sketch.Add(-0.0);
        sketch.Add(1e-12);
        sketch.Add(DDSketch.MinIndexable);
        sketch.Add(2e-9);
        Assert.Equal(DDSketch.ZeroKey, sketch.KeyOf(DDSketch.MinIndexable));
        Assert.NotEqual(DDSketch.ZeroKey, sketch.KeyOf(2e-9));
        Assert.Equal(4, sketch.ZeroCount);
        Assert.Equal(5, sketch.Count);
        Assert.Equal(0.0, sketch.Quantile(0.8)); // rank 4 of 5: still a zero
        Assert.Equal(2e-9, sketch.Quantile(0.81), 2e-9 * 0.005); // rank 5: the 2e-9 value, within alpha
    }

    [Fact]
    public void An_all_zero_sketch_reports_zero_for_every_quantile()
    {
        var sketch = new DDSketch();
        sketch.Add(0.0, 10);
        foreach (double q in new[] { 0.0, 0.5, 0.999, 1.0 })
        {
            Assert.Equal(0.0, sketch.Quantile(q));
        }
    }

    [Fact]
    public void A_weight_of_three_equals_three_single_adds()
    {
        var weighted = new DDSketch();
        var repeated = new DDSketch();
        foreach (double v in new[] { 0.0, 0.3, 1.7, 42.0 })
        {
            weighted.Add(v, 3);
            repeated.Add(v);
            repeated.Add(v);
            repeated.Add(v);
        }

        Assert.Equal(repeated.Count, weighted.Count);
        foreach (double v in new[] { 0.0, 0.3, 1.7, 42.0 })
        {
            Assert.Equal(repeated.CountOf(repeated.KeyOf(v)), weighted.CountOf(weighted.KeyOf(v)));
        }

        for (int i = 0; i <= 12; i++)
        {
            Assert.Equal(repeated.Quantile(i / 12.0), weighted.Quantile(i / 12.0));
        }
    }

    [Fact]
    public void Rank_convention_is_the_lower_inverse_cdf()
    {
        // Values 1..100 with weight 1: q = 0.95 -> rank ceil(95) = 95 (not 96: 0.95 * 100 is 95 in
        // exact arithmetic), q = 0.951 -> rank 96, q = 0 -> rank 1.
        var sketch = new DDSketch(0.001);
        for (int v = 1; v <= 100; v++)
        {
            sketch.Add(v);
        }

        // Tolerance alpha, widened by 1e-9 relative: 1 and 100 sit close to bucket edges where the
        // estimate's error is exactly alpha before rounding.
        const double Alpha = 0.001 * (1 + 1e-9);
        Assert.Equal(95.0, sketch.Quantile(0.95), 95.0 * Alpha);
        Assert.Equal(96.0, sketch.Quantile(0.951), 96.0 * Alpha);
        Assert.Equal(1.0, sketch.Quantile(0.0), 1.0 * Alpha);
        Assert.Equal(100.0, sketch.Quantile(1.0), 100.0 * Alpha);
        Assert.Equal(29.0, sketch.Quantile(0.29), 29.0 * Alpha); // 0.29 * 100 = 28.999999999999996 in double
        Assert.Equal(7.0, sketch.Quantile(0.07), 7.0 * Alpha);   // 0.07 * 100 = 7.000000000000001: the tolerance keeps rank 7
        Assert.Equal(7.000000000000001, 0.07 * 100);             // (the rounding the tolerance is there for)
    }

    [Fact]
    public void Empty_sketch_gives_nan_and_clear_empties_without_releasing_the_store()
    {
        var sketch = new DDSketch();
        Assert.True(sketch.IsEmpty);
        Assert.True(double.IsNaN(sketch.Quantile(0.5)));

        sketch.Add(3.0);
        sketch.Add(0.0);
        int buckets = sketch.AllocatedBuckets;
        sketch.Clear();
        Assert.True(sketch.IsEmpty);
        Assert.Equal(0, sketch.ZeroCount);
        Assert.Equal(0, sketch.CountOf(sketch.KeyOf(3.0)));
        Assert.True(double.IsNaN(sketch.Quantile(0.5)));
        Assert.Equal(buckets, sketch.AllocatedBuckets);

        sketch.Add(5.0);
        Assert.Equal(5.0, sketch.Quantile(0.5), 5.0 * 0.005);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(-1e-3)]
    [InlineData(double.NegativeInfinity)]
    [InlineData(double.PositiveInfinity)]
    public void Invalid_values_are_refused(double value)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new DDSketch().Add(value));
    }

    [Fact]
    public void Invalid_levels_weights_and_accuracies_are_refused()
    {
        var sketch = new DDSketch();
        sketch.Add(1.0);
        Assert.Throws<ArgumentOutOfRangeException>(() => sketch.Quantile(1.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => sketch.Quantile(double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => new DDSketch().Quantile(-0.1));
        Assert.Throws<ArgumentOutOfRangeException>(() => sketch.Add(1.0, -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new DDSketch(0.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => new DDSketch(0.9));
    }
}

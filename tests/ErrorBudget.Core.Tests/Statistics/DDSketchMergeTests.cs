using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Statistics;

public class DDSketchMergeTests
{
    private static readonly double[] Levels = [0.0, 0.001, 0.01, 0.1, 0.25, 0.5, 0.75, 0.9, 0.95, 0.99, 0.999, 1.0];

    private static double[] Data(int seed, int n, double scale)
    {
        var random = new System.Random(seed);
        var x = new double[n];
        for (int i = 0; i < n; i++)
        {
            x[i] = i % 97 == 0 ? 0.0 : scale * Math.Exp(2 * random.NextDouble() - 1); // some zeros too
        }

        return x;
    }

    private static DDSketch Sketch(IEnumerable<double> values, long weight = 1)
    {
        var s = new DDSketch(0.005);
        foreach (double v in values)
        {
            s.Add(v, weight);
        }

        return s;
    }

    // Merging is integer addition of bucket counts, so equality is exact (check 30 of REFERENCE-VALUES.md).
    private static void AssertIdentical(DDSketch expected, DDSketch actual)
    {
        Assert.Equal(expected.Count, actual.Count);
        Assert.Equal(expected.ZeroCount, actual.ZeroCount);
        for (int key = -3000; key <= 3000; key++)
        {
            Assert.Equal(expected.CountOf(key), actual.CountOf(key));
        }

        foreach (double q in Levels)
        {
            Assert.Equal(expected.Quantile(q), actual.Quantile(q));
        }
    }

    [Fact]
    public void Merged_sketches_equal_the_sketch_of_the_union()
    {
        // B lies partly below and partly above A, so the merge grows the store both ways.
        double[] a = Data(1, 20_000, 1.0);
        double[] b = Data(2, 30_000, 50.0).Concat(Data(3, 5000, 0.001)).ToArray();
        DDSketch merged = Sketch(a);
        merged.Merge(Sketch(b));
        AssertIdentical(Sketch(a.Concat(b)), merged);
    }

    [Fact]
    public void Merge_with_scale_equals_adding_each_value_with_that_weight()
    {
        double[] a = Data(4, 5000, 1.0);
        double[] b = Data(5, 7000, 3.0);
        DDSketch merged = Sketch(a);
        merged.Merge(Sketch(b), scale: 3);
        DDSketch expected = Sketch(a);
        foreach (double v in b)
        {
            expected.Add(v, 3);
        }

        AssertIdentical(expected, merged);
    }

    [Fact]
    public void Merge_order_does_not_matter()
    {
        DDSketch[] parts = [Sketch(Data(6, 3000, 0.01)), Sketch(Data(7, 4000, 1.0)), Sketch(Data(8, 5000, 100.0))];
        DDSketch abc = parts[0].Clone();
        abc.Merge(parts[1]);
        abc.Merge(parts[2]);

        DDSketch cba = new(0.005);
        cba.Merge(parts[2]);
        cba.Merge(parts[1]);
        cba.Merge(parts[0]);

        DDSketch bc = parts[1].Clone();
        bc.Merge(parts[2]);
        DDSketch aThenBc = parts[0].Clone();
        aThenBc.Merge(bc);

        AssertIdentical(abc, cba);
        AssertIdentical(abc, aThenBc);
    }

    [Fact]
    public void Merging_a_sketch_into_itself_doubles_it()
    {
        double[] a = Data(9, 2000, 1.0);
        DDSketch self = Sketch(a);
        self.Merge(self);
        AssertIdentical(Sketch(a, weight: 2), self);
    }

    [Fact]
    public void Merging_different_accuracies_is_refused()
    {
        Assert.Throws<ArgumentException>(() => new DDSketch(0.01).Merge(new DDSketch(0.005)));
    }

    [Fact]
    public void Clone_is_independent_of_the_original()
    {
        DDSketch original = Sketch(Data(10, 1000, 1.0));
        DDSketch copy = original.Clone();
        copy.Add(1e6);
        Assert.Equal(1000, original.Count);
        Assert.Equal(1001, copy.Count);
        Assert.Equal(0, original.CountOf(original.KeyOf(1e6)));
    }
}

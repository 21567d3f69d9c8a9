using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Statistics;

public class DDSketchAllocationTests
{
    [Fact]
    public void Adding_inside_the_established_range_allocates_nothing()
    {
        var sketch = new DDSketch(0.005);
        var values = new double[10_000];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = i % 50 == 0 ? 0.0 : 1e-3 * Math.Pow(1e6, (double)i / values.Length); // 1 mm .. 1 km
        }

        AddAll(sketch, values); // establishes the range and warms up the code
        sketch.Clear();

        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int round = 0; round < 10; round++)
        {
            AddAll(sketch, values);
        }

        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.Equal(0, allocated);
        Assert.Equal(2L * 10 * values.Length, sketch.Count); // AddAll adds each value twice
    }

    [Fact]
    public void The_store_grows_geometrically_only_when_the_range_grows()
    {
        // Geometric growth by a quarter: reaching 6000 keys in steps of one key needs O(log n)
        // allocations (log_1.25(6000 / 64) = 20 per side at most), and the store stays within
        // 1.25^2 of the key range (the new length is 1.25 x the larger of the needed range and the
        // old length; plus the initial 64 buckets: the documented bound of the growth policy).
        var sketch = new DDSketch(0.005);
        int previous = 0, growths = 0;
        for (int key = 0; key < 3000; key++)
        {
            sketch.AddKey(key, 1);
            sketch.AddKey(-key, 1);
            if (sketch.AllocatedBuckets != previous)
            {
                growths++;
                previous = sketch.AllocatedBuckets;
            }
        }

        Assert.InRange(growths, 1, 42);
        Assert.InRange(sketch.AllocatedBuckets, 5999, (1.5625 * 5999) + 64);
        Assert.Equal(2, sketch.CountOf(0)); // added as +0 and -0
        Assert.Equal(1, sketch.CountOf(17));
        Assert.Equal(1, sketch.CountOf(-2999));
    }

    private static void AddAll(DDSketch sketch, double[] values)
    {
        foreach (double v in values)
        {
            sketch.AddKey(sketch.KeyOf(v), 1);
            sketch.Add(v);
        }
    }
}

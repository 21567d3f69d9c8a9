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
    public void The_bulk_inserts_into_a_compact_cell_sketch_allocate_nothing_inside_the_range()
    {
        // The hot loop's case: compact cell sketch, wide epoch share and batch sketches.
        int[] keys = SketchFixtures.Keys(95, 1000);
        var cell = new DDSketch(0.005, compactCounts: true);
        var share = new DDSketch(0.005);
        var batches = new BatchSketchSet(0.005, 4);
        batches.SetBlock(0, keys.Length, keys.Length);
        void InsertAll()
        {
            DDSketch.AddKeysToBoth(keys, cell, 1, share, 37);
            DDSketch.AddKeysBatched(keys, cell, 1, share, 37, batches);
            cell.AddKeys(keys, 1);
        }

        InsertAll(); // establishes the ranges and warms up the code

        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int round = 0; round < 10; round++)
        {
            InsertAll();
        }

        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.Equal(0, allocated);
        Assert.True(cell.IsCompact);
        Assert.Equal(11L * 3 * keys.Length, cell.Count);
    }

    // The growth rule (DDSketch.EnsureRange): the needed range n is the old store joined with the new
    // keys; the new length is L = n + floor(n / 8) (at least 64); the slack L - n goes 3/4 to the side
    // that grew, 1/4 to the other (1/2 each for the first store).
    // Bound on the length, R = range of keys added: the slack c carried on the side that did not grow
    // is at worst (keys always growing the same way) the sum of the quarters left there by earlier
    // growths, c' = c + n / 32, while n grows by 9/8 per growth; the fixed point is c = n / 4, so
    // R >= n - c = 3/4 n and L <= 9/8 n <= 3/2 R. The first store's 64-bucket minimum adds at most 64:
    // L <= 1.5 R + 64.
    // Bound on the growths: each store is at least 9/8 of the one before (n > old length) and the first
    // is 64 long, so k growths give L >= 64 (9/8)^(k-1), i.e. k <= 1 + log_(9/8)(L / 64).
    private static double LengthBound(int range) => (1.5 * range) + 64;

    private static double GrowthBound(double length) => 1 + (Math.Log(length / 64) / Math.Log(9.0 / 8.0));

    [Fact]
    public void The_store_grows_geometrically_only_when_the_range_grows()
    {
        // Keys growing both ways in steps of one: range 5999, so L <= 9062 and at most 43 growths.
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

        Assert.InRange(sketch.AllocatedBuckets, 5999, LengthBound(5999));
        Assert.InRange(growths, 1, GrowthBound(LengthBound(5999)));
        Assert.Equal(2, sketch.CountOf(0)); // added as +0 and -0
        Assert.Equal(1, sketch.CountOf(17));
        Assert.Equal(1, sketch.CountOf(-2999));
    }

    [Fact]
    public void Keys_growing_one_way_keep_the_store_within_one_and_a_half_times_their_range()
    {
        // The worst case of the bound above: the length approaches 1.5 R from below, so a growth rule
        // with more slack (a quarter: 5/3 R) fails here. Checked after every key.
        var sketch = new DDSketch(0.005);
        double worstExcess = double.NegativeInfinity; // max of L - (1.5 R + 64)
        for (int key = 0; key < 100_000; key++)
        {
            sketch.AddKey(key, 1);
            worstExcess = Math.Max(worstExcess, sketch.AllocatedBuckets - LengthBound(key + 1));
        }

        Assert.True(worstExcess <= 0, $"the store exceeded 1.5 R + 64 by {worstExcess} buckets");
        Assert.InRange(sketch.AllocatedBuckets, 1.4 * 100_000, LengthBound(100_000)); // near the bound: the case is the worst one
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

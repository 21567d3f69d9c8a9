using ErrorBudget.Core.Statistics;
using static ErrorBudget.Core.Tests.Statistics.SketchFixtures;

namespace ErrorBudget.Core.Tests.Statistics;

/// <summary>
/// A compact sketch widens itself before its total weight passes uint.MaxValue = 4,294,967,295, and
/// then holds exactly the counts of a wide sketch fed the same (no wrap-around modulo 2^32).
/// </summary>
public sealed class DDSketchWideningTests
{
    private const long Large = 3_000_000_000; // fits in 32 bits once, not twice

    [Fact]
    public void A_total_of_exactly_uint_max_stays_compact_and_one_more_widens()
    {
        var sketch = new DDSketch(0.005, compactCounts: true);
        sketch.AddKey(5, uint.MaxValue);
        Assert.True(sketch.IsCompact);
        Assert.Equal(uint.MaxValue, sketch.CountOf(5));
        sketch.AddKey(5, 1);
        Assert.False(sketch.IsCompact);
        Assert.Equal(1L << 32, sketch.CountOf(5)); // a 32-bit bucket would have wrapped to 0
        Assert.Equal(1L << 32, sketch.Count);
    }

    [Fact]
    public void Two_adds_of_three_billion_give_six_billion_in_the_bucket()
    {
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        foreach (DDSketch s in new[] { compact, wide })
        {
            s.AddKey(17, Large);
            s.AddKey(17, Large);
            s.AddKey(DDSketch.ZeroKey, Large);
            s.AddKey(-3, 1);
        }

        Assert.False(compact.IsCompact);
        Assert.Equal(2 * Large, compact.CountOf(17));
        Assert.Equal(Large, compact.ZeroCount);
        AssertIdentical(wide, compact);
    }

    [Fact]
    public void AddKeys_with_a_large_weight_widens_before_adding()
    {
        // 997 keys x 5e6 = 5e9 > uint.MaxValue: the one call must widen first.
        int[] keys = Keys(80, 997);
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        compact.AddKeys(keys, 1);
        wide.AddKeys(keys, 1);
        Assert.True(compact.IsCompact);
        compact.AddKeys(keys, 5_000_000);
        wide.AddKeys(keys, 5_000_000);
        Assert.False(compact.IsCompact);
        AssertIdentical(wide, compact);
    }

    [Fact]
    public void Merge_with_a_large_scale_widens_before_adding()
    {
        int[] keys = Keys(81, 2000);
        var source = new DDSketch(0.005, compactCounts: true);
        source.AddKeys(keys, 1);
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        compact.Merge(source, scale: 2_000_000); // 4e9: still fits
        wide.Merge(source, scale: 2_000_000);
        Assert.True(compact.IsCompact);
        compact.Merge(source, scale: 2_000_000); // 8e9: must widen
        wide.Merge(source, scale: 2_000_000);
        Assert.False(compact.IsCompact);
        AssertIdentical(wide, compact);

        compact.Merge(compact, scale: 3); // into itself, now wide: 3.2e10
        wide.Merge(wide, scale: 3);
        AssertIdentical(wide, compact);
    }

    [Fact]
    public void A_compact_sketch_merged_into_itself_past_the_limit_widens()
    {
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        foreach (DDSketch s in new[] { compact, wide })
        {
            s.AddKeys(Keys(82, 500), 4_000_000); // 2e9
            s.Merge(s, scale: 2);                // + 4e9
        }

        Assert.False(compact.IsCompact);
        AssertIdentical(wide, compact);
    }

    [Fact]
    public void A_sketch_passed_as_both_targets_is_checked_against_the_sum_of_its_weights()
    {
        // Each weight alone fits (3e9), the two together (6e9) do not.
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        int[] key = [9];
        DDSketch.AddKeysToBoth(key, compact, Large, compact, Large);
        DDSketch.AddKeysToBoth(key, wide, Large, wide, Large);
        Assert.False(compact.IsCompact);
        Assert.Equal(2 * Large, compact.CountOf(9));
        AssertIdentical(wide, compact);

        // The batched insert: first is also the epoch share; 2 x 3e9 again. The batch store is 64-bit.
        var shared = new DDSketch(0.005, compactCounts: true);
        var batches = new BatchSketchSet(0.005, 2);
        batches.SetBlock(0, 2, 2);
        int[] keys = [4, 4];
        DDSketch.AddKeysBatched(keys, shared, Large / 2, shared, Large, batches);
        Assert.False(shared.IsCompact);
        Assert.Equal((2 * (Large / 2)) + (2 * Large), shared.CountOf(4));
        Assert.Equal(Large, batches.CountOf(0));
        Assert.Equal(Large, batches.CountOf(1));
    }

    [Fact]
    public void A_widened_store_has_the_same_buckets_and_twice_the_bytes()
    {
        var sketch = new DDSketch(0.005, compactCounts: true);
        sketch.AddKeys(Keys(84, 3000), 1);
        int buckets = sketch.AllocatedBuckets;
        long bytes = sketch.AllocatedBytes;
        sketch.AddKey(0, Large * 2);
        Assert.False(sketch.IsCompact);
        Assert.Equal(buckets, sketch.AllocatedBuckets); // key 0 lies inside the range: no growth
        Assert.Equal(2 * bytes, sketch.AllocatedBytes);
    }
}

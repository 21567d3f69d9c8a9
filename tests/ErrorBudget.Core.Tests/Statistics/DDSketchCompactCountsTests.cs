using ErrorBudget.Core.Statistics;
using static ErrorBudget.Core.Tests.Statistics.SketchFixtures;

namespace ErrorBudget.Core.Tests.Statistics;

/// <summary>
/// Compact (32-bit) and wide (64-bit) sketches fed the same keys and weights are identical through
/// every insert path and every compact/wide combination of Merge. Counts are integers: exact equality.
/// </summary>
public sealed class DDSketchCompactCountsTests
{
    public static TheoryData<bool, bool> Pairs => new() { { true, true }, { true, false }, { false, true }, { false, false } };

    [Fact]
    public void AddKey_and_Add_give_the_same_sketch_compact_or_wide()
    {
        int[] keys = Keys(1, 5000, scale: 0.01);
        long[] weights = Weights(1, keys.Length, 1000);
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        for (int i = 0; i < keys.Length; i++)
        {
            compact.AddKey(keys[i], weights[i]);
            wide.AddKey(keys[i], weights[i]);
        }

        foreach (double value in new[] { 0.0, 1e-12, 3.7, 1e3 })
        {
            compact.Add(value, 5);
            wide.Add(value, 5);
        }

        Assert.True(compact.IsCompact);
        Assert.False(wide.IsCompact);
        AssertIdentical(wide, compact);
    }

    [Fact]
    public void AddKeys_gives_the_same_sketch_compact_or_wide()
    {
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        for (int call = 0; call < 6; call++)
        {
            // Spans of several lengths and scales, so the store grows both ways between calls.
            int[] keys = Keys(10 + call, 100 + (137 * call), scale: Math.Pow(10, call - 3));
            compact.AddKeys(keys, call + 1);
            wide.AddKeys(keys, call + 1);
        }

        Assert.True(compact.IsCompact);
        AssertIdentical(wide, compact);
    }

    [Theory]
    [MemberData(nameof(Pairs))]
    public void AddKeysToBoth_equals_AddKeys_on_wide_sketches_for_every_combination(bool firstCompact, bool secondCompact)
    {
        var first = new DDSketch(0.005, firstCompact);
        var second = new DDSketch(0.005, secondCompact);
        var firstReference = new DDSketch(0.005);
        var secondReference = new DDSketch(0.005);
        for (int call = 0; call < 4; call++)
        {
            int[] keys = Keys(20 + call, 997, scale: Math.Pow(10, 2 - call));
            DDSketch.AddKeysToBoth(keys, first, 1, second, 1234);
            firstReference.AddKeys(keys, 1);
            secondReference.AddKeys(keys, 1234);
        }

        Assert.Equal(firstCompact, first.IsCompact);
        Assert.Equal(secondCompact, second.IsCompact);
        AssertIdentical(firstReference, first);
        AssertIdentical(secondReference, second);
    }

    [Theory]
    [MemberData(nameof(Pairs))]
    public void AddKeysBatched_equals_AddKeys_per_batch_for_every_combination(bool firstCompact, bool allCompact)
    {
        // Three blocks of 997 trials of a 2,991-trial run in 7 batches (batches straddle blocks), keys over
        // three scales so the batch store grows both ways, zero keys included.
        const int blockTrials = 997, calls = 3, batchCount = 7;
        const int totalTrials = blockTrials * calls;
        var first = new DDSketch(0.005, firstCompact);
        var all = new DDSketch(0.005, allCompact);
        var batches = new BatchSketchSet(0.005, batchCount);
        var firstReference = new DDSketch(0.005);
        var allReference = new DDSketch(0.005);
        DDSketch[] batchReferences = [.. Enumerable.Range(0, batchCount).Select(_ => new DDSketch(0.005))];
        for (int call = 0; call < calls; call++)
        {
            int[] keys = Keys(30 + call, blockTrials, scale: Math.Pow(10, call - 1));
            batches.SetBlock(call * blockTrials, blockTrials, totalTrials);
            DDSketch.AddKeysBatched(keys, first, 1, all, 37, batches);
            firstReference.AddKeys(keys, 1);
            allReference.AddKeys(keys, 37);
            for (int j = 0; j < blockTrials; j++)
            {
                int trial = (call * blockTrials) + j;
                batchReferences[trial * batchCount / totalTrials].AddKey(keys[j], 37);
            }
        }

        AssertIdentical(firstReference, first);
        AssertIdentical(allReference, all);
        for (int g = 0; g < batchCount; g++)
        {
            var rebuilt = new DDSketch(0.005);
            batches.AddBatchTo(g, rebuilt);
            Assert.Equal(batchReferences[g].Count, batches.CountOf(g));
            AssertIdentical(batchReferences[g], rebuilt);
        }
    }

    [Theory]
    [MemberData(nameof(Pairs))]
    public void Merge_gives_the_same_sketch_for_every_combination_of_compact_and_wide(bool targetCompact, bool sourceCompact)
    {
        // The source lies partly below and partly above the target, so the merge grows the store both ways.
        int[] a = Keys(40, 3000);
        int[] b = [.. Keys(41, 2000, scale: 100.0), .. Keys(42, 2000, scale: 0.001)];
        long[] weights = Weights(40, b.Length, 50);
        var target = new DDSketch(0.005, targetCompact);
        var source = new DDSketch(0.005, sourceCompact);
        var expected = new DDSketch(0.005);
        target.AddKeys(a, 2);
        expected.AddKeys(a, 2);
        for (int i = 0; i < b.Length; i++)
        {
            source.AddKey(b[i], weights[i]);
            expected.AddKey(b[i], weights[i] * 3);
        }

        target.Merge(source, scale: 3);
        Assert.Equal(targetCompact, target.IsCompact);
        AssertIdentical(expected, target);
    }

    [Fact]
    public void A_compact_sketch_merged_into_itself_equals_a_wide_one()
    {
        int[] keys = Keys(50, 2000);
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        compact.AddKeys(keys, 3);
        wide.AddKeys(keys, 3);
        compact.Merge(compact, scale: 2);
        wide.Merge(wide, scale: 2);
        Assert.True(compact.IsCompact);
        AssertIdentical(wide, compact);
    }

    [Fact]
    public void Clone_and_Clear_keep_a_compact_sketch_compact_and_identical_to_a_wide_one()
    {
        int[] keys = Keys(60, 1500);
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        compact.AddKeys(keys, 1);
        wide.AddKeys(keys, 1);
        DDSketch copy = compact.Clone();
        compact.AddKey(0, 1); // the copy must not see this
        Assert.True(copy.IsCompact);
        AssertIdentical(wide, copy);

        int allocated = compact.AllocatedBuckets;
        compact.Clear();
        wide.Clear();
        Assert.True(compact.IsEmpty);
        Assert.Equal(allocated, compact.AllocatedBuckets); // the store is kept
        compact.AddKeys(keys, 2);
        wide.AddKeys(keys, 2);
        Assert.True(compact.IsCompact);
        AssertIdentical(wide, compact);
    }

    [Fact]
    public void A_compact_store_takes_half_the_bytes_of_a_wide_one_for_the_same_keys()
    {
        int[] keys = Keys(70, 10_000);
        var compact = new DDSketch(0.005, compactCounts: true);
        var wide = new DDSketch(0.005);
        compact.AddKeys(keys, 1);
        wide.AddKeys(keys, 1);
        Assert.Equal(wide.AllocatedBuckets, compact.AllocatedBuckets);
        Assert.Equal(wide.UsedBuckets, compact.UsedBuckets);
        Assert.Equal(4L * compact.AllocatedBuckets, compact.AllocatedBytes);
        Assert.Equal(8L * wide.AllocatedBuckets, wide.AllocatedBytes);
        Assert.Equal(wide.AllocatedBytes, 2 * compact.AllocatedBytes);
    }

    [Fact]
    public void UsedBuckets_is_the_span_from_the_lowest_to_the_highest_key()
    {
        var sketch = new DDSketch(0.005, compactCounts: true);
        Assert.Equal(0, sketch.UsedBuckets);
        sketch.AddKey(DDSketch.ZeroKey, 4); // the zero bucket is not in the store
        Assert.Equal(0, sketch.UsedBuckets);
        sketch.AddKey(-7, 1);
        Assert.Equal(1, sketch.UsedBuckets);
        sketch.AddKey(12, 1);
        Assert.Equal(20, sketch.UsedBuckets); // -7 .. 12
        Assert.Equal(0, new DDSketch(0.005).AllocatedBytes);
    }
}

using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Statistics;

/// <summary>The hot loop's bulk inserts are the same as inserting each key on its own.</summary>
public sealed class DDSketchBulkInsertTests
{
    private static int[] Keys(int seed)
    {
        var rng = new System.Random(seed);
        var mapping = new DDSketch(0.005);
        // Lognormal-ish magnitudes over four decades plus exact zeros, like position errors.
        return Enumerable.Range(0, 997)
            .Select(_ => rng.Next(10) == 0 ? DDSketch.ZeroKey : mapping.KeyOf(Math.Exp(rng.NextDouble() * 9.2 - 4.6)))
            .ToArray();
    }

    [Fact]
    public void AddKeys_equals_AddKey_one_at_a_time()
    {
        var keys = Keys(3);
        var bulk = new DDSketch(0.005);
        var single = new DDSketch(0.005);
        bulk.AddKeys(keys, 7);
        foreach (int k in keys)
        {
            single.AddKey(k, 7);
        }

        AssertSame(single, bulk);
    }

    [Fact]
    public void AddKeysToBoth_equals_AddKeys_on_each_sketch()
    {
        var first = Keys(4);
        var second = Keys(5);
        var a = new DDSketch(0.005);
        var b = new DDSketch(0.005);
        var refA = new DDSketch(0.005);
        var refB = new DDSketch(0.005);
        foreach (var keys in new[] { first, second })
        {
            DDSketch.AddKeysToBoth(keys, a, 1, b, 1234);
            refA.AddKeys(keys, 1);
            refB.AddKeys(keys, 1234);
        }

        AssertSame(refA, a);
        AssertSame(refB, b);
    }

    [Fact]
    public void AddKeysBatched_refuses_keys_that_do_not_match_the_block_before_touching_any_sketch()
    {
        var keys = Keys(6);
        var first = new DDSketch(0.005, compactCounts: true);
        var all = new DDSketch(0.005);
        var batches = new BatchSketchSet(0.005, 3);
        batches.SetBlock(0, keys.Length - 1, keys.Length);
        Assert.Throws<ArgumentException>(() => DDSketch.AddKeysBatched(keys, first, 1, all, 1, batches));
        Assert.True(first.IsEmpty && all.IsEmpty);
        Assert.Equal(0, batches.CountOf(0) + batches.CountOf(1) + batches.CountOf(2));

        // A refused call leaves no pending weight: a compact sketch still takes exactly uint.MaxValue.
        first.AddKeys([3], uint.MaxValue); // a bulk add: it would see a stale pending weight
        Assert.True(first.IsCompact);
    }

    [Fact]
    public void A_block_splits_its_trials_into_the_batches_floor_t_B_over_T_and_a_bad_block_is_refused()
    {
        // 10 trials in 3 batches: floor(3 t / 10) = 0,0,0,0,1,1,1,2,2,2. Block [3, 8) holds 0,1,1,1,2.
        var batches = new BatchSketchSet(0.005, 3);
        batches.SetBlock(3, 5, 10);
        Assert.Equal([0, 1, 1, 1, 2], batches.TrialBatch.ToArray());
        var first = new DDSketch(0.005);
        DDSketch.AddKeysBatched([5, 6, 7, DDSketch.ZeroKey, 9], first, 1, first, 2, batches);
        Assert.Equal([2L, 6L, 2L], [batches.CountOf(0), batches.CountOf(1), batches.CountOf(2)]);
        var middle = new DDSketch(0.005);
        batches.AddBatchTo(1, middle);
        Assert.Equal(6, middle.Count);
        Assert.Equal(2, middle.ZeroCount);
        Assert.Equal(2, middle.CountOf(6));
        Assert.Equal(2, middle.CountOf(7));
        Assert.Equal(0, middle.CountOf(5));

        Assert.Throws<ArgumentOutOfRangeException>(() => batches.SetBlock(8, 5, 10));
        Assert.Throws<ArgumentOutOfRangeException>(() => batches.SetBlock(-1, 5, 10));
        Assert.Throws<ArgumentOutOfRangeException>(() => batches.SetBlock(0, 0, 10));
        Assert.Throws<ArgumentOutOfRangeException>(() => new BatchSketchSet(0.005, 0));
        Assert.Throws<ArgumentException>(() => batches.AddBatchTo(0, new DDSketch(0.01)));
    }

    private static void AssertSame(DDSketch expected, DDSketch actual)
    {
        Assert.Equal(expected.Count, actual.Count);
        Assert.Equal(expected.ZeroCount, actual.ZeroCount);
        for (int key = -2000; key <= 2000; key++)
        {
            Assert.Equal(expected.CountOf(key), actual.CountOf(key));
        }

        foreach (double q in new[] { 0.0, 0.1, 0.5, 0.95, 0.999, 1.0 })
        {
            Assert.Equal(expected.Quantile(q), actual.Quantile(q));
        }
    }
}

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
    public void AddKeysSegmented_refuses_decreasing_ends_before_touching_any_sketch()
    {
        var keys = Keys(6);
        var first = new DDSketch(0.005, compactCounts: true);
        var all = new DDSketch(0.005);
        DDSketch[] segments = [new DDSketch(0.005), new DDSketch(0.005), new DDSketch(0.005)];
        Assert.Throws<ArgumentException>(() => DDSketch.AddKeysSegmented(keys, first, 1, all, 1, [500, 400, keys.Length], segments));
        Assert.Throws<ArgumentException>(() => DDSketch.AddKeysSegmented(keys, first, 1, all, 1, [-1, 400, keys.Length], segments));
        Assert.True(first.IsEmpty && all.IsEmpty && segments.All(s => s.IsEmpty));

        // A refused call leaves no pending weight: a compact sketch still takes exactly uint.MaxValue.
        first.AddKeys([3], uint.MaxValue); // a bulk add: it would see a stale pending weight
        Assert.True(first.IsCompact);
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

namespace ErrorBudget.Core.Statistics;

/// <summary>
/// The area-weighted sketches of the trial batches (batch-means intervals), B of them in one 64-bit
/// store laid out [batch][bucket] with a common key offset, so one range check serves every batch and
/// the hot loop's insert (<see cref="DDSketch.AddKeysBatched"/>) is a single pass over a block's keys
/// whatever the number of batches (ten separate sketches cost ten range checks and ten short loops per
/// (epoch, user): W1's sketch stage took 1.32-1.44 thread-seconds with ten batches against 0.70-0.77 with
/// one, of about 3.5 in all; issue 6, 2026-12-02).
/// </summary>
/// <remarks>
/// Counts are integers, so the result does not depend on the order of inserts; <see cref="AddBatchTo"/>
/// turns batch g into the same buckets a <see cref="DDSketch"/> would hold had it received batch g's
/// keys itself.
/// </remarks>
public sealed class BatchSketchSet
{
    private const int InitialBuckets = 64;

    private readonly long[] zeroCounts;
    private readonly long[] totals;
    private long[] counts = [];
    private int length;                // buckets per batch
    private int offset;                // key of bucket 0 of every batch
    private int minKey = int.MaxValue; // lowest and highest key added to any batch
    private int maxKey = int.MinValue;

    // The current block: trial j of the block belongs to batch trialBatch[j]; its bucket for key k is
    // counts[trialBase[j] + k] (trialBase = batch * length - offset, refreshed when the store moves).
    private int[] trialBatch = [];
    private int[] trialBase = [];
    private readonly int[] blockCounts; // trials of the current block per batch
    private int blockFirstTrial = -1;
    private int blockTrials;
    private int blockRunTrials;
    private int firstBatch;
    private int lastBatch = -1;

    /// <param name="batches">B &gt;= 1.</param>
    public BatchSketchSet(double relativeAccuracy, int batches)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(batches, 1);
        RelativeAccuracy = relativeAccuracy;
        Batches = batches;
        zeroCounts = new long[batches];
        totals = new long[batches];
        blockCounts = new int[batches];
    }

    public double RelativeAccuracy { get; }

    public int Batches { get; }

    /// <summary>The trials of the current block (set by <see cref="SetBlock"/>).</summary>
    public int BlockTrials => blockTrials;

    /// <summary>The total weight of batch g.</summary>
    public long CountOf(int batch) => totals[batch];

    internal long[] Counts => counts;

    internal ReadOnlySpan<int> TrialBase => trialBase.AsSpan(0, blockTrials);

    internal ReadOnlySpan<int> TrialBatch => trialBatch.AsSpan(0, blockTrials);

    internal long[] ZeroCounts => zeroCounts;

    /// <summary>
    /// The block of trials [firstTrial, firstTrial + count) of a run of <paramref name="totalTrials"/>:
    /// trial t belongs to batch floor(t B / T), the same split for every user.
    /// Range: 0 &lt;= firstTrial, 1 &lt;= count, firstTrial + count &lt;= totalTrials.
    /// </summary>
    public void SetBlock(int firstTrial, int count, int totalTrials)
    {
        if (firstTrial < 0 || count < 1 || (long)firstTrial + count > totalTrials)
        {
            throw new ArgumentOutOfRangeException(nameof(count), $"Block [{firstTrial}, {(long)firstTrial + count}) does not lie in [0, {totalTrials}).");
        }

        if (firstTrial == blockFirstTrial && count == blockTrials && totalTrials == blockRunTrials)
        {
            return; // every tile of a block sets the same block: nothing to recompute
        }

        if (trialBatch.Length < count)
        {
            trialBatch = new int[count];
            trialBase = new int[count];
        }

        blockFirstTrial = firstTrial;
        blockTrials = count;
        blockRunTrials = totalTrials;
        Array.Clear(blockCounts);
        for (int j = 0; j < count; j++)
        {
            int g = (int)((long)(firstTrial + j) * Batches / totalTrials);
            trialBatch[j] = g;
            blockCounts[g]++;
        }

        firstBatch = trialBatch[0];
        lastBatch = trialBatch[count - 1];
        RefreshBases();
    }

    /// <summary>Adds, for each batch g in the block, the number of the block's trials in g times weight to g's total.</summary>
    internal void AddBlockTotals(long weight)
    {
        for (int g = firstBatch; g <= lastBatch; g++)
        {
            totals[g] += blockCounts[g] * weight;
        }
    }

    /// <summary>Makes keys lo..hi addressable in every batch (growth by an eighth, as DDSketch).</summary>
    internal void Reserve(int lo, int hi)
    {
        minKey = Math.Min(minKey, lo);
        maxKey = Math.Max(maxKey, hi);
        if (length > 0 && lo >= offset && (long)hi < (long)offset + length)
        {
            return;
        }

        long needLo = length == 0 ? lo : Math.Min(lo, offset);
        long needHi = length == 0 ? hi : Math.Max(hi, (long)offset + length - 1);
        long needed = needHi - needLo + 1;
        long slack = Math.Max(InitialBuckets, needed / 8);
        long newLength = needed + slack;
        if (newLength * Batches > Array.MaxLength)
        {
            throw new InvalidOperationException($"Batch sketches would need {newLength * Batches} buckets; keys span [{needLo}, {needHi}].");
        }

        // The slack goes to both sides, so growth either way is amortised.
        int newOffset = (int)Math.Max(int.MinValue + 1L, needLo - (slack / 2));
        var grown = new long[newLength * Batches];
        if (length > 0)
        {
            for (int g = 0; g < Batches; g++)
            {
                Array.Copy(counts, (long)g * length, grown, (g * newLength) + (offset - newOffset), length);
            }
        }

        counts = grown;
        length = (int)newLength;
        offset = newOffset;
        RefreshBases();
    }

    /// <summary>Adds batch g's buckets and zero weight to <paramref name="target"/> (as if it had received g's keys).</summary>
    public void AddBatchTo(int batch, DDSketch target)
    {
        ArgumentNullException.ThrowIfNull(target);
        ArgumentOutOfRangeException.ThrowIfNegative(batch);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(batch, Batches);
        if (target.RelativeAccuracy != RelativeAccuracy)
        {
            throw new ArgumentException($"Relative accuracies differ ({target.RelativeAccuracy} vs {RelativeAccuracy}).", nameof(target));
        }

        if (zeroCounts[batch] > 0)
        {
            target.AddKey(DDSketch.ZeroKey, zeroCounts[batch]);
        }

        for (int key = minKey; key <= maxKey; key++)
        {
            long c = counts[((long)batch * length) + key - offset];
            if (c != 0)
            {
                target.AddKey(key, c);
            }
        }
    }

    private void RefreshBases()
    {
        for (int j = 0; j < blockTrials; j++)
        {
            trialBase[j] = (trialBatch[j] * length) - offset;
        }
    }
}

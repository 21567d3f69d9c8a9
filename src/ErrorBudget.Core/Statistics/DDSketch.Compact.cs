using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Statistics;

/// <summary>
/// The compact (32-bit) counts of <see cref="DDSketch"/> and the widening to 64 bits. The only rule:
/// the store widens before an add or merge that could take the total weight past
/// <see cref="uint.MaxValue"/>; every bucket is at most the total, so none can overflow.
/// </summary>
public sealed partial class DDSketch
{
    private const ulong WideningThreshold = uint.MaxValue + 1UL; // the first total a compact store cannot hold

    private bool compact;    // the store in use is narrow (32-bit counts)
    private ulong incoming;  // weight noted by NoteIncoming, not yet checked (saturated at the threshold)

    /// <summary>True while the counts are 32-bit (asked for and not yet widened).</summary>
    internal bool IsCompact => compact;

    /// <summary>
    /// First half of the widening check of an add: notes that keyCount * weight is about to arrive.
    /// A bulk insert notes every role a sketch plays before <see cref="CommitIncoming"/> decides, so a
    /// sketch passed twice is checked against the sum. Negative weights saturate (they widen).
    /// </summary>
    private void NoteIncoming(long keyCount, long weight)
    {
        if (!compact || keyCount == 0 || weight == 0)
        {
            return;
        }

        // Saturating: only "more than fits" matters, and keyCount * weight may overflow.
        ulong n = (ulong)keyCount, w = (ulong)weight;
        ulong product = w > WideningThreshold / n ? WideningThreshold : n * w;
        incoming = Math.Min(incoming + product, WideningThreshold);
    }

    /// <summary>Second half: widens if the noted weight could take the total past uint.MaxValue.</summary>
    private void CommitIncoming()
    {
        // While compact, count <= uint.MaxValue, so the subtraction does not wrap.
        if (compact && incoming > uint.MaxValue - (ulong)count)
        {
            Widen();
        }

        incoming = 0;
    }

    /// <summary>Copies the 32-bit counts into a 64-bit store of the same length and offset.</summary>
    [MethodImpl(MethodImplOptions.NoInlining)]
    private void Widen()
    {
        var grown = new long[narrow.Length];
        if (minKey <= maxKey)
        {
            for (int i = minKey - offset; i <= maxKey - offset; i++)
            {
                grown[i] = narrow[i]; // buckets outside [minKey, maxKey] are zero in both
            }
        }

        wide = grown;
        narrow = [];
        compact = false;
    }
}

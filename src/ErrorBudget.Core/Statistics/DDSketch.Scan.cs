namespace ErrorBudget.Core.Statistics;

/// <summary>The key scan of <see cref="DDSketch"/>'s bulk inserts.</summary>
public sealed partial class DDSketch
{
    /// <summary>Lowest and highest non-zero key of a span (none: lo &gt; hi) and how many zero keys it holds.</summary>
    internal static void ScanKeys(ReadOnlySpan<int> keys, out int lo, out int hi, out long zeros)
    {
        lo = int.MaxValue;
        hi = int.MinValue;
        zeros = 0;
        foreach (int key in keys)
        {
            if (key == ZeroKey)
            {
                zeros++;
                continue;
            }

            lo = Math.Min(lo, key);
            hi = Math.Max(hi, key);
        }
    }
}

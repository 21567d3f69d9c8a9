using ErrorBudget.Core.Grid;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Area weights as integers, so that area-weighted bucket counts add up exactly in any order:
/// this is what keeps the service-area percentiles identical for any thread count and tile size.
/// The largest cell weighs 2^bits; bits is chosen so no count can overflow 2^62
/// (quantisation error of a weight: at most 2^-(bits+1) of the largest cell's weight).
/// </summary>
internal sealed class AreaWeights
{
    private AreaWeights(long[] weights, int bits)
    {
        Integer = weights;
        Bits = bits;
        Total = weights.Sum();
    }

    public long[] Integer { get; }

    public int Bits { get; }

    public long Total { get; }

    public static AreaWeights For(ServiceGrid grid, long maxSamplesPerCell)
    {
        double max = grid.Cells.Max(c => c.AreaWeight);
        double headroom = 62 - Math.Log2(Math.Max(1.0, grid.Count)) - Math.Log2(Math.Max(1.0, maxSamplesPerCell));
        int bits = (int)Math.Clamp(Math.Floor(headroom), 0, 24);
        double scale = Math.Pow(2, bits);
        var w = new long[grid.Count];
        for (int i = 0; i < w.Length; i++)
        {
            w[i] = Math.Max(1L, (long)Math.Round(grid.Cells[i].AreaWeight / max * scale));
        }

        return new AreaWeights(w, bits);
    }
}

using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Everything one cell accumulates over the run. Owned by the cell's tile; all counts are integers
/// so the order in which epochs arrive does not matter.
/// </summary>
/// <remarks>
/// The sketches use compact (32-bit) counts: a grid holds five per cell (64,800 cells at 1 degree)
/// and they receive weight 1 per sample, so they stay compact up to 4.29e9 samples a cell and widen
/// themselves beyond (identical results either way, see <see cref="DDSketch"/>).
/// </remarks>
internal sealed class CellAccumulator(double relativeAccuracy)
{
    public DDSketch Hpe { get; } = new(relativeAccuracy, compactCounts: true);

    public DDSketch Vpe { get; } = new(relativeAccuracy, compactCounts: true);

    public DDSketch Pdop { get; } = new(relativeAccuracy, compactCounts: true);

    public DDSketch Hdop { get; } = new(relativeAccuracy, compactCounts: true);

    public DDSketch Vdop { get; } = new(relativeAccuracy, compactCounts: true);

    /// <summary>Epochs seen (counted once per epoch, not per trial block).</summary>
    public long Epochs;

    /// <summary>Epochs with fewer than 4 satellites or a singular geometry.</summary>
    public long UnavailableEpochs;

    /// <summary>Sum over epochs of the satellites above the mask.</summary>
    public long SatsInViewSum;

    /// <summary>Position-error samples (available epochs x trials).</summary>
    public long Samples;

    /// <summary>[integrity] accumulators; null without the table.</summary>
    public IntegrityCellAccumulator? Integrity { get; init; }
}

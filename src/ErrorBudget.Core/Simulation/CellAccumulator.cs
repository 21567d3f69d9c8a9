using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Everything one cell accumulates over the run. Owned by the cell's tile; all counts are integers
/// so the order in which epochs arrive does not matter.
/// </summary>
internal sealed class CellAccumulator(double relativeAccuracy)
{
    public DDSketch Hpe { get; } = new(relativeAccuracy);

    public DDSketch Vpe { get; } = new(relativeAccuracy);

    public DDSketch Pdop { get; } = new(relativeAccuracy);

    public DDSketch Hdop { get; } = new(relativeAccuracy);

    public DDSketch Vdop { get; } = new(relativeAccuracy);

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

using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The service-area figures of one epoch, merged from every tile (and trial block) under a lock.
/// Weights are the integer area weights, so merge order never changes the result.
/// </summary>
internal sealed class EpochAccumulator(double relativeAccuracy, int pendingJobs)
{
    private int _pending = pendingJobs;

    public object Gate { get; } = new();

    public DDSketch Hpe { get; } = new(relativeAccuracy);

    public DDSketch Vpe { get; } = new(relativeAccuracy);

    public DDSketch Pdop { get; } = new(relativeAccuracy);

    public long WeightSum;

    public long UnavailableWeight;

    public long SatsInViewWeighted;

    public long Samples;

    /// <summary>Marks one job done; true for the caller that completed the epoch.</summary>
    public bool CompleteOne() => Interlocked.Decrement(ref _pending) == 0;
}

using ErrorBudget.Core.Orbits;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The satellite side of one (epoch, trial block): satellite states and the satellite-level truth
/// errors of every trial in the block, shared read-only by all user tiles.
/// </summary>
internal sealed class EpochWork(int satellites, int laneCapacity)
{
    public int Epoch;
    public double TimeSeconds;
    public double RotationAngleRad;
    public int FirstTrial;
    public int BlockTrials;
    public bool IsFirstBlock;
    public EpochAccumulator Accumulator = null!;
    public int PendingTiles;

    public SatelliteState[] States { get; } = new SatelliteState[satellites];

    /// <summary>See <see cref="Errors.SatelliteErrorSampler"/> for the layout.</summary>
    public double[] SatelliteErrors { get; } = new double[satellites * laneCapacity * Errors.SatelliteErrorSampler.Components];
}

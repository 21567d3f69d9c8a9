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

    /// <summary>
    /// ECEF satellite positions as three coordinate arrays (structure of arrays), padded to whole
    /// Vector256 widths with the Earth's centre, which no user sees above a non-negative mask; filled by
    /// <see cref="FillPositions"/> for the kernel's vectorised visibility test.
    /// </summary>
    public double[] PositionX { get; } = new double[PaddedLength(satellites)];
    public double[] PositionY { get; } = new double[PaddedLength(satellites)];
    public double[] PositionZ { get; } = new double[PaddedLength(satellites)];

    /// <summary>Copies the states' ECEF positions into the coordinate arrays.</summary>
    public void FillPositions()
    {
        for (int i = 0; i < States.Length; i++)
        {
            PositionX[i] = States[i].PositionEcef.X;
            PositionY[i] = States[i].PositionEcef.Y;
            PositionZ[i] = States[i].PositionEcef.Z;
        }
    }

    private static int PaddedLength(int satellites) => (satellites + 3) / 4 * 4;

    /// <summary>See <see cref="Errors.SatelliteErrorSampler"/> for the layout.</summary>
    public double[] SatelliteErrors { get; } = new double[satellites * laneCapacity * Errors.SatelliteErrorSampler.Components];

    /// <summary>
    /// <see cref="SatelliteErrors"/> in single precision for the trial loop (same layout), each trial's
    /// mean clock error over all satellites removed: see <see cref="FillSingle"/>.
    /// </summary>
    public float[] SatelliteErrorsSingle { get; } = new float[satellites * laneCapacity * Errors.SatelliteErrorSampler.Components];

    /// <summary>
    /// Rounds the block's errors to float after taking out each trial's mean clock error over all
    /// satellites. A range error common to every satellite changes only the receiver clock (every row
    /// of S sums to zero), so removing it changes no position error, and what float must carry is then
    /// the satellites' differences, not a possibly large common part (a missed frequency offset drifts
    /// the same for a whole shell). Padded lanes are zeroed.
    /// </summary>
    public void FillSingle(int laneCapacity, int trials) =>
        SingleErrors.Convert(SatelliteErrors, SatelliteErrorsSingle, States.Length, laneCapacity, trials, _meanClock);

    private readonly double[] _meanClock = new double[laneCapacity];

    /// <summary>With [faults]: true at [satellite * laneCapacity + trial] when an injected fault is active.</summary>
    public bool[] Faulted { get; } = new bool[satellites * laneCapacity];
}

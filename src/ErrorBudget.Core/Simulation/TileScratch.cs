using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>Per-worker buffers, rented for a tile job and reused: the hot loop allocates nothing.</summary>
internal sealed class TileScratch
{
    /// <param name="laneCapacity">Trials per block rounded up to whole vectors.</param>
    public TileScratch(int satellites, int laneCapacity, double relativeAccuracy)
    {
        Visible = new int[satellites];
        LineOfSight = new Vec3[satellites];
        LineOfSightEnu = new Vec3[satellites];
        SinElevation = new double[satellites];
        Weights = new double[satellites];
        TruthVariance = new double[satellites];
        Projection = new double[4 * satellites];
        Coefficients = new double[8 * satellites];
        Normals = new double[3 * laneCapacity];
        LaneCapacity = laneCapacity;
        KeysH = new int[laneCapacity];
        KeysV = new int[laneCapacity];
        Hpe = new DDSketch(relativeAccuracy);
        Vpe = new DDSketch(relativeAccuracy);
        Pdop = new DDSketch(relativeAccuracy);
    }

    public int[] Visible { get; }
    public Vec3[] LineOfSight { get; }
    public Vec3[] LineOfSightEnu { get; }
    public double[] SinElevation { get; }
    public double[] Weights { get; }
    public double[] TruthVariance { get; }
    public double[] Projection { get; }
    public double[] Covariance4 { get; } = new double[16];
    public double[] Covariance3 { get; } = new double[9];
    public double[] Cholesky3 { get; } = new double[9];

    /// <summary>
    /// Position error (E, N, U) common to every trial of this (epoch, user): S applied to the user-level
    /// deterministic range biases (e.g. a relativistic term the receiver misses). Zero when there are none.
    /// </summary>
    public double[] CommonOffset { get; } = new double[3];

    /// <summary>Per visible satellite: line of sight and projection coefficients (see TileKernel.BuildCoefficients).</summary>
    public double[] Coefficients { get; }
    /// <summary>User-level standard normals: axis k of trial j at [k * LaneCapacity + j].</summary>
    public double[] Normals { get; }

    public int LaneCapacity { get; }

    /// <summary>Sketch keys of the block's HPE and VPE samples, one per trial (padded lanes at the end).</summary>
    public int[] KeysH { get; }
    public int[] KeysV { get; }

    /// <summary>This job's share of the epoch's area-weighted sketches, merged under the epoch lock.</summary>
    public DDSketch Hpe { get; }
    public DDSketch Vpe { get; }
    public DDSketch Pdop { get; }
    public long WeightSum;
    public long UnavailableWeight;
    public long SatsInViewWeighted;
    public long Samples;

    public void ResetEpochShare()
    {
        Hpe.Clear();
        Vpe.Clear();
        Pdop.Clear();
        WeightSum = 0;
        UnavailableWeight = 0;
        SatsInViewWeighted = 0;
        Samples = 0;
    }
}

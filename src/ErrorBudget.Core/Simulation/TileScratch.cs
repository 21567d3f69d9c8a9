using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>Per-worker buffers, rented for a tile job and reused: the hot loop allocates nothing.</summary>
internal sealed class TileScratch
{
    /// <param name="laneCapacity">Trials per block rounded up to whole vectors.</param>
    public TileScratch(int satellites, int laneCapacity, double relativeAccuracy, int batches = 1)
    {
        Batches = batches;
        HpeRun = new BatchSketchSet(relativeAccuracy, batches);
        VpeRun = new BatchSketchSet(relativeAccuracy, batches);
        Visible = new int[satellites];
        LineOfSight = new Vec3[satellites];
        LineOfSightEnu = new Vec3[satellites];
        SinElevation = new double[satellites];
        Weights = new double[satellites];
        TruthVariance = new double[satellites];
        IntegrityVariance = new double[satellites];
        Projection = new double[4 * satellites];
        Coefficients = new float[8 * satellites];
        Normals = new float[3 * laneCapacity];
        LaneCapacity = laneCapacity;
        KeysH = new int[laneCapacity];
        KeysV = new int[laneCapacity];
        Hpe = new DDSketch(relativeAccuracy);
        Vpe = new DDSketch(relativeAccuracy);
        Pdop = new DDSketch(relativeAccuracy);
    }

    public int[] Visible { get; }

    /// <summary>Six Vector256 of one visibility block (unit vector ECEF, then ENU), see TileKernel.SelectVisible.</summary>
    public double[] BlockLanes { get; } = new double[24];
    public Vec3[] LineOfSight { get; }
    public Vec3[] LineOfSightEnu { get; }
    public double[] SinElevation { get; }
    public double[] Weights { get; }
    public double[] TruthVariance { get; }

    /// <summary>The receiver's assumed range-error variance per visible satellite (the inverse weights), m^2.</summary>
    public double[] IntegrityVariance { get; }
    public double[] Projection { get; }
    public double[] Covariance4 { get; } = new double[16];
    public double[] Covariance3 { get; } = new double[9];
    public double[] Cholesky3 { get; } = new double[9];

    /// <summary><see cref="Cholesky3"/> rounded to float for the single-precision trial loop.</summary>
    public float[] CholeskySingle { get; } = new float[9];

    /// <summary>
    /// Position error (E, N, U) common to every trial of this (epoch, user): S applied to the user-level
    /// deterministic range biases (e.g. a relativistic term the receiver misses). Zero when there are none.
    /// </summary>
    public double[] CommonOffset { get; } = new double[3];

    /// <summary><see cref="CommonOffset"/> rounded to float for the single-precision trial loop.</summary>
    public float[] OffsetSingle { get; } = new float[3];

    /// <summary>Per visible satellite: line of sight and projection coefficients (see TileKernel.BuildCoefficients).</summary>
    public float[] Coefficients { get; }

    /// <summary>User-level standard normals (single precision): axis k of trial j at [k * LaneCapacity + j].</summary>
    public float[] Normals { get; }

    public int LaneCapacity { get; }

    /// <summary>Sketch keys of the block's HPE and VPE samples, one per trial (padded lanes at the end).</summary>
    public int[] KeysH { get; }
    public int[] KeysV { get; }

    /// <summary>This job's share of the epoch's area-weighted sketches, merged under the epoch lock.</summary>
    public DDSketch Hpe { get; }
    public DDSketch Vpe { get; }
    public DDSketch Pdop { get; }
    /// <summary>Trial batches of the batch-means intervals (1: none; the epoch share is then <see cref="Hpe"/> alone).</summary>
    public int Batches { get; }

    /// <summary>
    /// This worker's run-long area-weighted sketches per trial batch: the kernel adds each key to its
    /// batch here directly (no per-epoch merge), and the workers' sketches are merged once at the end.
    /// </summary>
    public BatchSketchSet HpeRun { get; }
    public BatchSketchSet VpeRun { get; }

    /// <summary>Stage timing (benchmark only); null when not measuring.</summary>
    public StageClock? Stages { get; set; }

    /// <summary>Integrity buffers and shares; null without [integrity].</summary>
    public IntegrityScratch? Integrity { get; set; }

    /// <summary>Splits a block's trials [firstTrial, firstTrial + count) into the batches b = floor(t B / T) (<see cref="BatchSketchSet.SetBlock"/>).</summary>
    public void SetTrialBlock(int firstTrial, int count, int totalTrials)
    {
        HpeRun.SetBlock(firstTrial, count, totalTrials);
        VpeRun.SetBlock(firstTrial, count, totalTrials);
    }

    public long WeightSum;
    public long UnavailableWeight;
    public long SatsInViewWeighted;
    public long Samples;

    /// <summary>Rounds <see cref="Cholesky3"/> and <see cref="CommonOffset"/> to the float copies the trial loop reads.</summary>
    public void RoundForTrialLoop()
    {
        for (int q = 0; q < 9; q++)
        {
            CholeskySingle[q] = (float)Cholesky3[q];
        }

        for (int q = 0; q < 3; q++)
        {
            OffsetSingle[q] = (float)CommonOffset[q];
        }
    }

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

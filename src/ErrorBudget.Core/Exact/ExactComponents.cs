using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Core.Exact;

/// <summary>
/// The Gaussian position error of every (cell, epoch): for the user's visible satellites the truth
/// range-error variance sigma_i^2 = clock(age)^2 + orbit projected on the line of sight + user(el)^2
/// (each satellite's errors independent of the others for one user), C = S diag(sigma^2) S^T in ENU,
/// kept as the eigenvalues of its horizontal block and its vertical sigma. The geometry (mask, weights,
/// S) is the sampling kernel's own step (<see cref="TileKernel.TrySolveGeometry"/>). A scenario that
/// misses or mis-sets a relativistic term adds a deterministic range bias b_i per satellite (its clock
/// term, as <see cref="Errors.SatelliteErrorSampler"/> adds it to every trial, and the user's missed Sagnac
/// or Shapiro terms, as the kernel's common offset): the error's mean S b, kept along the horizontal
/// block's eigenvectors and up.
/// </summary>
internal sealed class ExactComponents
{
    public ExactComponents(ServiceGrid grid, int epochs)
    {
        Cells = grid.Count;
        Epochs = epochs;
        Lambda1 = new double[Cells * epochs];
        Lambda2 = new double[Cells * epochs];
        SigmaUp = new double[Cells * epochs];
        SatsInView = new int[Cells * epochs];
        Pdop = new double[Cells * epochs];
        Hdop = new double[Cells * epochs];
        Vdop = new double[Cells * epochs];
        MeanAlong = new double[Cells * epochs];
        MeanAcross = new double[Cells * epochs];
        MeanUp = new double[Cells * epochs];
    }

    public int Cells { get; }
    public int Epochs { get; }

    /// <summary>[cell * Epochs + epoch]; NaN where the epoch has no solution.</summary>
    public double[] Lambda1 { get; }
    public double[] Lambda2 { get; }
    public double[] SigmaUp { get; }
    public int[] SatsInView { get; }
    public double[] Pdop { get; }
    public double[] Hdop { get; }
    public double[] Vdop { get; }

    /// <summary>The mean horizontal error along the long and the short axis of the horizontal covariance, metres (0 without a bias).</summary>
    public double[] MeanAlong { get; }
    public double[] MeanAcross { get; }

    /// <summary>The mean vertical error, metres (0 without a bias).</summary>
    public double[] MeanUp { get; }

    public static ExactComponents Build(Scenario scenario, ServiceGrid grid, int threads, CancellationToken ct)
    {
        int epochs = scenario.Run.Epochs;
        int satellites = scenario.TotalSatellites;
        var result = new ExactComponents(grid, epochs);
        var setup = new SimulationSetup(scenario, new RunOptions { Threads = threads });
        var kernel = new TileKernel(setup, [], useSimd: true); // its geometry step only: the same mask, weights and S as a sampled run
        var schedule = new UploadSchedule(scenario, scenario.Run.Seed);
        var works = new EpochWork[epochs];
        var clockVariance = new double[epochs * satellites];
        var clockBias = new double[epochs * satellites];
        var relativity = new Relativity.RelativisticClockError(scenario);
        var userBias = new Relativity.RelativisticUserBias(scenario.Relativity);
        var frames = new (Vec3 R, Vec3 A, Vec3 C)[epochs * satellites];
        double u2 = scenario.Clock.UploadSigmaMeters * scenario.Clock.UploadSigmaMeters;
        double g2 = scenario.Clock.GrowthSigmaMetersPerSecond * scenario.Clock.GrowthSigmaMetersPerSecond;
        for (int e = 0; e < epochs; e++)
        {
            double t = scenario.Run.EpochTimeSeconds(e);
            double angle = setup.StartRotationAngleRad + (Wgs84.EarthRotationRateRadPerSecond * t);
            var w = new EpochWork(satellites, SimulationSetup.NormalBatch) { Epoch = e, TimeSeconds = t, RotationAngleRad = angle };
            setup.Constellation.Propagate(t, setup.StartRotationAngleRad, w.States);
            w.FillPositions();
            works[e] = w;
            for (int s = 0; s < satellites; s++)
            {
                var (r, a, c) = OrbitFrame.RadialAlongCross(w.States[s].PositionInertial, w.States[s].VelocityInertial);
                frames[(e * satellites) + s] = (EarthRotation.InertialToEarthFixed(r, angle), EarthRotation.InertialToEarthFixed(a, angle), EarthRotation.InertialToEarthFixed(c, angle));
                schedule.AgeOfData(s, t, out _, out double age);
                // The simple clock model: offset N(0, upload^2) + rate N(0, growth^2) x age (SatelliteErrorSampler).
                clockVariance[(e * satellites) + s] = u2 + (g2 * age * age);
                clockBias[(e * satellites) + s] = relativity.IsActive
                    ? relativity.ClockRangeErrorMeters(s, age, t, w.States[s].EccentricAnomalyRad)
                    : 0.0;
            }
        }

        OrbitErrorSpec orbit = scenario.Orbit;
        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, threads), CancellationToken = ct };
        Parallel.For(0, grid.Count, options, () => new Buffers(satellites), (cellIndex, _, b) =>
        {
            GridCell cell = grid.Cells[cellIndex];
            for (int e = 0; e < epochs; e++)
            {
                int i = (cellIndex * epochs) + e;
                bool solved = kernel.TrySolveGeometry(works[e], cell, b.Scratch, out int m, out Dop dop);
                result.SatsInView[i] = m;
                if (!solved)
                {
                    result.Lambda1[i] = result.Lambda2[i] = result.SigmaUp[i] = double.NaN;
                    result.Pdop[i] = result.Hdop[i] = result.Vdop[i] = double.NaN;
                    continue;
                }

                TileScratch s = b.Scratch;
                for (int k = 0; k < m; k++)
                {
                    int sat = s.Visible[k];
                    Vec3 u = s.LineOfSight[k];
                    var (fr, fa, fc) = frames[(e * satellites) + sat];
                    double ur = Vec3.Dot(u, fr), ua = Vec3.Dot(u, fa), uc = Vec3.Dot(u, fc);
                    double orbitVariance = (orbit.RadialSigmaMeters * orbit.RadialSigmaMeters * ur * ur)
                        + (orbit.AlongSigmaMeters * orbit.AlongSigmaMeters * ua * ua)
                        + (orbit.CrossSigmaMeters * orbit.CrossSigmaMeters * uc * uc);
                    b.Variance[k] = clockVariance[(e * satellites) + sat] + orbitVariance + s.TruthVariance[k];
                    b.Bias[k] = clockBias[(e * satellites) + sat]
                        + (userBias.IsActive ? userBias.RangeErrorMeters(works[e].States[sat].PositionEcef, cell.Frame.Origin) : 0.0);
                }

                PositionSolution.ProjectCovariance(s.Projection.AsSpan(0, 4 * m), m, b.Variance.AsSpan(0, m), b.Covariance3);
                var (l1, l2) = GaussianPositionError.Eigenvalues(b.Covariance3[0], b.Covariance3[1], b.Covariance3[4]);
                result.Lambda1[i] = l1;
                result.Lambda2[i] = l2;
                result.SigmaUp[i] = Math.Sqrt(b.Covariance3[8]);
                result.Pdop[i] = dop.Pdop;
                result.Hdop[i] = dop.Hdop;
                result.Vdop[i] = dop.Vdop;
                if (relativity.IsActive || userBias.IsActive)
                {
                    // Mean = S b (rows E, N, U of S; a bias common to every satellite moves only the clock).
                    double me = 0, mn = 0, mu = 0;
                    for (int k = 0; k < m; k++)
                    {
                        me += s.Projection[k] * b.Bias[k];
                        mn += s.Projection[m + k] * b.Bias[k];
                        mu += s.Projection[(2 * m) + k] * b.Bias[k];
                    }

                    var (along, across) = GaussianPositionError.MeanInEigenFrame(b.Covariance3[0], b.Covariance3[1], b.Covariance3[4], me, mn);
                    result.MeanAlong[i] = along;
                    result.MeanAcross[i] = across;
                    result.MeanUp[i] = mu;
                }
            }

            return b;
        }, _ => { });
        return result;
    }

    private sealed class Buffers(int satellites)
    {
        public TileScratch Scratch { get; } = new(satellites, SimulationSetup.NormalBatch, SimulationSetup.SketchAccuracy);
        public double[] Variance { get; } = new double[satellites];
        public double[] Bias { get; } = new double[satellites];
        public double[] Covariance3 { get; } = new double[9];
    }
}

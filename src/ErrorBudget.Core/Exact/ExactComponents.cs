using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Exact;

/// <summary>
/// The Gaussian position error of every (cell, epoch): for the user's visible satellites the truth
/// range-error variance sigma_i^2 = clock(age)^2 + orbit projected on the line of sight + user(el)^2
/// (each satellite's errors independent of the others for one user), C = S diag(sigma^2) S^T in ENU,
/// kept as the eigenvalues of its horizontal block and its vertical sigma. The same geometry, mask and
/// weights as the sampling kernel.
/// </summary>
internal sealed class ExactComponents
{
    public ExactComponents(Scenario scenario, ServiceGrid grid, int epochs)
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

    public static ExactComponents Build(Scenario scenario, ServiceGrid grid, int threads, CancellationToken ct)
    {
        int epochs = scenario.Run.Epochs;
        int satellites = scenario.TotalSatellites;
        var result = new ExactComponents(scenario, grid, epochs);
        var constellation = Constellation.FromShells(scenario.Shells);
        var schedule = new UploadSchedule(scenario, scenario.Run.Seed);
        double start = EarthRotation.EarthRotationAngle(scenario.Run.StartUtc);
        var positions = new Vec3[epochs * satellites];
        var clockVariance = new double[epochs * satellites];
        var frames = new (Vec3 R, Vec3 A, Vec3 C)[epochs * satellites];
        var states = new SatelliteState[satellites];
        double u2 = scenario.Clock.UploadSigmaMeters * scenario.Clock.UploadSigmaMeters;
        double g2 = scenario.Clock.GrowthSigmaMetersPerSecond * scenario.Clock.GrowthSigmaMetersPerSecond;
        for (int e = 0; e < epochs; e++)
        {
            double t = scenario.Run.EpochTimeSeconds(e);
            double angle = start + (Wgs84.EarthRotationRateRadPerSecond * t);
            constellation.Propagate(t, start, states);
            for (int s = 0; s < satellites; s++)
            {
                var (r, a, c) = OrbitFrame.RadialAlongCross(states[s].PositionInertial, states[s].VelocityInertial);
                frames[(e * satellites) + s] = (EarthRotation.InertialToEarthFixed(r, angle), EarthRotation.InertialToEarthFixed(a, angle), EarthRotation.InertialToEarthFixed(c, angle));
                positions[(e * satellites) + s] = states[s].PositionEcef;
                schedule.AgeOfData(s, t, out _, out double age);
                // The simple clock model: offset N(0, upload^2) + rate N(0, growth^2) x age (SatelliteErrorSampler).
                clockVariance[(e * satellites) + s] = u2 + (g2 * age * age);
            }
        }

        var truth = new ElevationVarianceTable(UserErrorModel.From(scenario.User));
        var assumed = new ElevationVarianceTable(UserErrorModel.From(scenario.Assumed.User));
        double ure2 = scenario.Assumed.UreSigmaMeters * scenario.Assumed.UreSigmaMeters;
        double sinMask = Math.Sin(scenario.Grid.MaskDeg * Math.PI / 180.0);
        OrbitErrorSpec orbit = scenario.Orbit;
        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, threads), CancellationToken = ct };
        Parallel.For(0, grid.Count, options, () => new Buffers(satellites), (cellIndex, _, b) =>
        {
            EnuFrame frame = grid.Cells[cellIndex].Frame;
            for (int e = 0; e < epochs; e++)
            {
                int m = 0;
                for (int s = 0; s < satellites; s++)
                {
                    Vec3 d = positions[(e * satellites) + s] - frame.Origin;
                    Vec3 u = d / d.Norm;
                    Vec3 enu = frame.ToEnu(u);
                    if (enu.Z < sinMask)
                    {
                        continue;
                    }

                    var (fr, fa, fc) = frames[(e * satellites) + s];
                    double ur = Vec3.Dot(u, fr), ua = Vec3.Dot(u, fa), uc = Vec3.Dot(u, fc);
                    double orbitVariance = (orbit.RadialSigmaMeters * orbit.RadialSigmaMeters * ur * ur)
                        + (orbit.AlongSigmaMeters * orbit.AlongSigmaMeters * ua * ua)
                        + (orbit.CrossSigmaMeters * orbit.CrossSigmaMeters * uc * uc);
                    b.Enu[m] = enu;
                    b.Weights[m] = 1.0 / (ure2 + assumed.At(enu.Z));
                    b.Variance[m] = clockVariance[(e * satellites) + s] + orbitVariance + truth.At(enu.Z);
                    m++;
                }

                int i = (cellIndex * epochs) + e;
                result.SatsInView[i] = m;
                if (m < 4 || !PositionSolution.TrySolve(b.Enu.AsSpan(0, m), b.Weights.AsSpan(0, m), b.Projection.AsSpan(0, 4 * m), b.Covariance4, out Dop dop))
                {
                    result.Lambda1[i] = result.Lambda2[i] = result.SigmaUp[i] = double.NaN;
                    result.Pdop[i] = result.Hdop[i] = result.Vdop[i] = double.NaN;
                    continue;
                }

                PositionSolution.ProjectCovariance(b.Projection.AsSpan(0, 4 * m), m, b.Variance.AsSpan(0, m), b.Covariance3);
                var (l1, l2) = GaussianPositionError.Eigenvalues(b.Covariance3[0], b.Covariance3[1], b.Covariance3[4]);
                result.Lambda1[i] = l1;
                result.Lambda2[i] = l2;
                result.SigmaUp[i] = Math.Sqrt(b.Covariance3[8]);
                result.Pdop[i] = dop.Pdop;
                result.Hdop[i] = dop.Hdop;
                result.Vdop[i] = dop.Vdop;
            }

            return b;
        }, _ => { });
        return result;
    }

    private sealed class Buffers(int satellites)
    {
        public Vec3[] Enu { get; } = new Vec3[satellites];
        public double[] Weights { get; } = new double[satellites];
        public double[] Variance { get; } = new double[satellites];
        public double[] Projection { get; } = new double[4 * satellites];
        public double[] Covariance4 { get; } = new double[16];
        public double[] Covariance3 { get; } = new double[9];
    }
}

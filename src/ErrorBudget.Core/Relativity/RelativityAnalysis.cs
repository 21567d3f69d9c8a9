using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// Builds a scenario's <see cref="RelativityReport"/>: every satellite's offsets, and the range and position
/// errors its [relativity] choices cause. Deterministic (no random draws): these terms are the same in every
/// trial. Satellite-level range figures use every epoch of the run; the user-level (Sagnac, Shapiro) and position
/// figures every k-th epoch, k chosen so at most <see cref="UserEpochBudget"/> (user, epoch) pairs are visited.
/// </summary>
public static class RelativityAnalysis
{
    /// <summary>Most (user, epoch) pairs visited for the user-level and position figures.</summary>
    public const int UserEpochBudget = 200_000;

    public static RelativityReport Build(Scenario scenario, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        var constellation = Constellation.FromShells(scenario.Shells);
        var grid = ServiceGrid.From(scenario.Grid);
        var clock = new RelativisticClockError(scenario);
        var user = new RelativisticUserBias(scenario.Relativity);
        var ages = new SatelliteErrorSampler(scenario, scenario.Run.Seed);
        int n = constellation.Count;
        var frequency = new ErrorStatistics[n];
        var periodic = new ErrorStatistics[n];
        var sagnac = new ErrorStatistics[n];
        var shapiro = new ErrorStatistics[n];
        var satelliteError = new double[n];
        var position = new PositionAccumulator(scenario, n);
        var states = new SatelliteState[n];
        double angle0 = EarthRotation.EarthRotationAngle(scenario.Run.StartUtc);
        int epochs = scenario.Run.Epochs;
        int stride = (int)Math.Max(1, ((long)epochs * grid.Count + UserEpochBudget - 1) / UserEpochBudget);
        int sampled = 0;
        for (int e = 0; e < epochs; e++)
        {
            ct.ThrowIfCancellationRequested();
            double t = scenario.Run.EpochTimeSeconds(e);
            constellation.Propagate(t, angle0, states);
            for (int s = 0; s < n; s++)
            {
                ages.AgeOfData(s, t, out _, out double age);
                double f = clock.FrequencyOffsetRangeErrorMeters(s, age, t);
                double p = clock.EccentricityRangeErrorMeters(s, states[s].EccentricAnomalyRad);
                frequency[s].Add(f);
                periodic[s].Add(p);
                satelliteError[s] = f + p;
            }

            if (e % stride != 0)
            {
                continue;
            }

            sampled++;
            foreach (GridCell cell in grid.Cells)
            {
                position.Visit(cell, states, satelliteError, user, sagnac, shapiro);
            }
        }

        var rows = new RelativitySatelliteFigures[n];
        double gm = Wgs84.GravitationalParameter;
        for (int s = 0; s < n; s++)
        {
            SatelliteInfo info = constellation.Satellites[s];
            ShellSpec shell = scenario.Shells[info.ShellIndex];
            double a = shell.SemiMajorAxisMeters;
            double applied = RelativisticClockError.AppliedRate(scenario.Relativity, shell);
            rows[s] = new RelativitySatelliteFigures(
                s,
                info.ShellName,
                a,
                shell.Eccentricity,
                SecularRate.Velocity(a, gm),
                SecularRate.Gravitational(a, gm),
                SecularRate.Net(a, gm),
                applied,
                clock.ResidualRateOf(s),
                EccentricityTerm.AmplitudeSeconds(shell.Eccentricity, a),
                frequency[s],
                periodic[s],
                sagnac[s],   // zeros where the receiver applies the term (Visit)
                shapiro[s]);
        }

        return new RelativityReport(rows, position.Figures(), sampled);
    }

    /// <summary>Visits one (user, epoch): visible set, user-level terms per satellite, and dx = S eps.</summary>
    private sealed class PositionAccumulator
    {
        private readonly ElevationVarianceTable _assumedUser;
        private readonly double _assumedUre2;
        private readonly double _sinMask;
        private readonly Vec3[] _los;
        private readonly double[] _weights;
        private readonly double[] _eps;
        private readonly double[] _projection;
        private readonly double[] _covariance = new double[16];
        private ErrorStatistics _hpe;
        private ErrorStatistics _vpe;
        private ErrorStatistics _clock;

        public PositionAccumulator(Scenario scenario, int satellites)
        {
            // The same weights as the run's kernel: what the receiver believes.
            _assumedUser = new ElevationVarianceTable(UserErrorModel.From(scenario.Assumed.User));
            _assumedUre2 = scenario.Assumed.UreSigmaMeters * scenario.Assumed.UreSigmaMeters;
            _sinMask = Math.Sin(scenario.Grid.MaskDeg * Math.PI / 180.0);
            _los = new Vec3[satellites];
            _weights = new double[satellites];
            _eps = new double[satellites];
            _projection = new double[4 * satellites];
        }

        public void Visit(GridCell cell, SatelliteState[] states, double[] satelliteError, RelativisticUserBias user,
            ErrorStatistics[] sagnac, ErrorStatistics[] shapiro)
        {
            EnuFrame frame = cell.Frame;
            Vec3 origin = frame.Origin;
            int m = 0;
            for (int s = 0; s < states.Length; s++)
            {
                Vec3 d = states[s].PositionEcef - origin;
                Vec3 enu = frame.ToEnu(d / d.Norm);
                if (enu.Z < _sinMask)
                {
                    continue;
                }

                // A term the receiver applies is reported as zero (Build), so only its count matters:
                // the Shapiro logarithm was 1 % of W1's profile for figures nobody reads.
                sagnac[s].Add(user.SagnacMissed ? RelativisticUserBias.SagnacMeters(states[s].PositionEcef, origin) : 0.0);
                shapiro[s].Add(user.ShapiroMissed ? RelativisticUserBias.ShapiroMeters(states[s].PositionEcef, origin) : 0.0);
                _los[m] = enu;
                _weights[m] = 1.0 / (_assumedUre2 + _assumedUser.At(enu.Z));
                _eps[m] = satelliteError[s] + user.RangeErrorMeters(states[s].PositionEcef, origin);
                m++;
            }

            if (m < PositionSolution.MinSatellites
                || !PositionSolution.TrySolve(_los.AsSpan(0, m), _weights.AsSpan(0, m), _projection.AsSpan(0, 4 * m), _covariance, out _))
            {
                return;
            }

            Span<double> dx = stackalloc double[4];
            for (int q = 0; q < 4; q++)
            {
                double sum = 0.0;
                for (int i = 0; i < m; i++)
                {
                    sum += _projection[q * m + i] * _eps[i];
                }

                dx[q] = sum;
            }

            _hpe.Add(Math.Sqrt(dx[0] * dx[0] + dx[1] * dx[1]));
            _vpe.Add(Math.Abs(dx[2]));
            _clock.Add(dx[3]);
        }

        public RelativityPositionFigures Figures() => new(_hpe.Count, _hpe, _vpe, _clock);
    }
}

using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Relativity;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Tests.Geometry;
using MathNet.Numerics.LinearAlgebra;

namespace ErrorBudget.Core.Tests.Relativity;

/// <summary>The user-level terms (Sagnac, Shapiro) a receiver keeps when it misses them, and what they do to its position.</summary>
public class RelativisticUserBiasTests
{
    private const double C = PhysicalConstants.SpeedOfLight;
    private const double GpsA = 26_561_750.0;

    private static readonly (double Az, double El)[] Sky =
        [(0, 70), (60, 30), (120, 15), (180, 45), (240, 20), (300, 35), (30, 12), (270, 60)];

    private static RelativitySpec Spec(RelativityTermMode sagnac, RelativityTermMode shapiro) =>
        RelativitySpec.AllApplied with { Sagnac = sagnac, Shapiro = shapiro };

    /// <summary>A receiver at 40 N 10 E and GPS-radius satellites at the given azimuths and elevations (ECEF).</summary>
    private static (EnuFrame Frame, Vec3[] Satellites, Vec3[] LineOfSightEnu) Geometry()
    {
        var frame = EnuFrame.At(Geodetic.FromDegrees(40, 10, 0));
        Vec3 r = frame.Origin;
        var sats = new Vec3[Sky.Length];
        var los = new Vec3[Sky.Length];
        for (int i = 0; i < Sky.Length; i++)
        {
            los[i] = GeometryFixtures.LineOfSight(Sky[i].Az, Sky[i].El);
            Vec3 u = frame.ToEcefDelta(los[i]);
            double b = Vec3.Dot(r, u);
            double rho = -b + Math.Sqrt(b * b - Vec3.Dot(r, r) + GpsA * GpsA); // |r + rho u| = GpsA
            sats[i] = r + rho * u;
        }

        return (frame, sats, los);
    }

    [Fact]
    public void Applied_terms_give_nothing_and_the_bias_is_inactive()
    {
        var (frame, sats, _) = Geometry();
        var bias = new RelativisticUserBias(RelativitySpec.AllApplied);

        Assert.False(bias.IsActive);
        Assert.All(sats, s => Assert.Equal(0.0, bias.RangeErrorMeters(s, frame.Origin)));
    }

    [Fact]
    public void Missed_terms_are_the_sagnac_and_shapiro_ranges_within_their_bounds()
    {
        // REFERENCE-VALUES suggested checks 6 and 7: |Sagnac| <= 134 ns (about 40 m) for GPS; Shapiro 12.7 mm (zenith) to
        // 18.7 mm (horizon), under 2 cm for ground users (Navipedia eq. (1); IERS Conventions 2010 eq. 11.17).
        var (frame, sats, _) = Geometry();
        var both = new RelativisticUserBias(Spec(RelativityTermMode.Missed, RelativityTermMode.Missed));
        var sagnacOnly = new RelativisticUserBias(Spec(RelativityTermMode.Missed, RelativityTermMode.Applied));
        var shapiroOnly = new RelativisticUserBias(Spec(RelativityTermMode.Applied, RelativityTermMode.Missed));
        double bound = C * Sagnac.MaximumMagnitudeSeconds(GpsA, frame.Origin.Norm, Wgs84.EarthRotationRateRadPerSecond);

        Assert.True(both.IsActive);
        foreach (Vec3 s in sats)
        {
            double sagnac = sagnacOnly.RangeErrorMeters(s, frame.Origin);
            double shapiro = shapiroOnly.RangeErrorMeters(s, frame.Origin);
            Assert.Equal(C * Sagnac.DelaySeconds(s, frame.Origin, Wgs84.EarthRotationRateRadPerSecond), sagnac, 1e-12);
            Assert.InRange(Math.Abs(sagnac), 0, bound);
            Assert.InRange(shapiro, 0.0125, 0.0190);
            Assert.Equal(sagnac + shapiro, both.RangeErrorMeters(s, frame.Origin), 1e-12);
        }
    }

    [Fact]
    public void A_missed_sagnac_correction_moves_the_position_as_an_independent_nonlinear_solution_says()
    {
        // dx = S b through PositionSolution (equal weights) against an iterated least-squares fix from pseudoranges that
        // contain the bias, solved with the ECEF geometric model that leaves it out. They differ by the second-order
        // term of the linearisation, about b^2 / rho x DOP = (40 m)^2 / 2e7 m x 5 = 4e-4 m: allow 1e-3 m.
        const double linearisationTolerance = 1e-3;
        var (frame, sats, los) = Geometry();
        var bias = new RelativisticUserBias(Spec(RelativityTermMode.Missed, RelativityTermMode.Missed));
        double[] b = [.. sats.Select(s => bias.RangeErrorMeters(s, frame.Origin))];
        var weights = Enumerable.Repeat(1.0, sats.Length).ToArray();
        var (ok, projection, _, _) = GeometryFixtures.Solve(los, weights);
        Assert.True(ok);
        var dx = new double[4];
        for (int q = 0; q < 4; q++)
        {
            for (int i = 0; i < sats.Length; i++)
            {
                dx[q] += projection[q * sats.Length + i] * b[i];
            }
        }

        Vec3 fix = NonlinearFix(sats, [.. sats.Select((s, i) => (s - frame.Origin).Norm + b[i])], frame.Origin, out double clock);
        Vec3 error = frame.ToEnu(fix - frame.Origin);

        Assert.Equal(error.X, dx[0], linearisationTolerance);
        Assert.Equal(error.Y, dx[1], linearisationTolerance);
        Assert.Equal(error.Z, dx[2], linearisationTolerance);
        Assert.Equal(clock, dx[3], linearisationTolerance);
        // The Sagnac term differs from satellite to satellite (east negative, west positive), so it is not common
        // mode: missing it costs metres of position at mid-latitudes.
        Assert.True(Math.Sqrt(dx[0] * dx[0] + dx[1] * dx[1]) > 1.0, $"HPE {dx[0]}, {dx[1]}");
    }

    /// <summary>Gauss-Newton on rho_i = |s_i - x| + c dt from a start 1 km off, until the step is below 1e-9 m.</summary>
    private static Vec3 NonlinearFix(Vec3[] sats, double[] pseudoranges, Vec3 start, out double clock)
    {
        var x = Vector<double>.Build.DenseOfArray([start.X + 1000, start.Y - 700, start.Z + 500, 0]);
        for (int iteration = 0; iteration < 20; iteration++)
        {
            var g = Matrix<double>.Build.Dense(sats.Length, 4);
            var residual = Vector<double>.Build.Dense(sats.Length);
            for (int i = 0; i < sats.Length; i++)
            {
                Vec3 d = sats[i] - new Vec3(x[0], x[1], x[2]);
                double range = d.Norm;
                g[i, 0] = -d.X / range;
                g[i, 1] = -d.Y / range;
                g[i, 2] = -d.Z / range;
                g[i, 3] = 1;
                residual[i] = pseudoranges[i] - (range + x[3]);
            }

            var step = (g.TransposeThisAndMultiply(g)).Solve(g.TransposeThisAndMultiply(residual));
            x += step;
            if (step.L2Norm() < 1e-9)
            {
                break;
            }
        }

        clock = x[3];
        return new Vec3(x[0], x[1], x[2]);
    }
}

using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Orbits;

public class PropagationTests
{
    private static readonly ShellSpec Meo = new("meo", 24, 3, 1, 55.0, 26_560_000, 0.02, 40.0, 0.0, 0.0);

    [Fact]
    public void Geostationary_satellite_stays_fixed_in_the_earth_fixed_frame_over_a_day()
    {
        // Common practice: a GEO (a = 42,164.17 km, i = 0, e = 0) has a ground track that is a single point.
        const double toleranceMeters = 1000;
        var geo = new ShellSpec("geo", 3, 1, 0, 0.0, 42_164_170, 0.0, 0.0, 75.0, 0.0);
        var c = Constellation.FromShells(new[] { geo });
        var states = new SatelliteState[c.Count];
        double theta0 = EarthRotation.EarthRotationAngle(new DateTimeOffset(2031, 6, 1, 0, 0, 0, TimeSpan.Zero));
        c.Propagate(0, theta0, states);
        Vec3[] start = states.Select(s => s.PositionEcef).ToArray();
        for (double t = 600; t <= 86400; t += 600)
        {
            c.Propagate(t, theta0, states);
            for (int i = 0; i < c.Count; i++)
            {
                double drift = (states[i].PositionEcef - start[i]).Norm;
                Assert.True(drift < toleranceMeters, $"satellite {i} moved {drift} m by t = {t} s");
            }
        }
    }

    [Fact]
    public void Earth_fixed_radius_equals_inertial_radius_and_z_is_unchanged()
    {
        // Derived: the frames differ by a rotation about z.
        const double toleranceMeters = 1e-6;
        var c = Constellation.FromShells(new[] { Meo });
        var states = new SatelliteState[c.Count];
        c.Propagate(12345.0, 1.7, states);
        foreach (SatelliteState s in states)
        {
            Assert.Equal(s.PositionInertial.Norm, s.PositionEcef.Norm, toleranceMeters);
            Assert.Equal(s.PositionInertial.Z, s.PositionEcef.Z, toleranceMeters);
        }
    }

    [Fact]
    public void Propagate_matches_kepler_state_and_rotates_by_the_start_angle_plus_earth_rate()
    {
        // Contract of Propagate: inertial state from Kepler.StateInertial (WGS-84 GM), ECEF rotated by theta0 + omegaE t.
        const double toleranceMeters = 1e-6;
        var c = Constellation.FromShells(new[] { Meo });
        var states = new SatelliteState[c.Count];
        const double t = 5000.0, theta0 = 0.4;
        c.Propagate(t, theta0, states);
        for (int i = 0; i < c.Count; i++)
        {
            KeplerElements el = c.Satellites[i].Elements;
            Kepler.StateInertial(el, t, Wgs84.GravitationalParameter, out Vec3 r, out Vec3 v, out double bigE);
            Assert.Equal(0.0, (states[i].PositionInertial - r).Norm, toleranceMeters);
            Assert.Equal(0.0, (states[i].VelocityInertial - v).Norm, 1e-9);
            Assert.Equal(bigE, states[i].EccentricAnomalyRad, 1e-12);
            Vec3 ecef = EarthRotation.InertialToEarthFixed(r, theta0 + Wgs84.EarthRotationRateRadPerSecond * t);
            Assert.Equal(0.0, (states[i].PositionEcef - ecef).Norm, toleranceMeters);
        }
    }

    [Fact]
    public void Propagate_does_not_allocate()
    {
        // Hot-path contract: no allocation per epoch (bytes counted on this thread after a warm-up call).
        var c = Constellation.FromShells(new[] { Meo });
        Span<SatelliteState> states = new SatelliteState[c.Count];
        c.Propagate(0, 0.1, states);
        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int k = 1; k <= 2000; k++)
        {
            c.Propagate(k * 30.0, 0.1, states);
        }

        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.Equal(0L, allocated);
    }

    [Fact]
    public void Short_state_span_is_rejected()
    {
        // Contract of Propagate: the span must hold every satellite.
        var c = Constellation.FromShells(new[] { Meo });
        Assert.Throws<ArgumentException>(() => c.Propagate(0, 0, new SatelliteState[c.Count - 1]));
    }
}

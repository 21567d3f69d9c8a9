using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;

namespace ErrorBudget.Core.Tests.Orbits;

public class TwoBodyStateTests
{
    private const double Gm = Wgs84.GravitationalParameter;

    [Fact]
    public void Period_of_a_26560_km_orbit_is_half_a_sidereal_day()
    {
        // Common practice: a GPS-like orbit (a = 26,560 km) repeats twice per sidereal day (86164.0905 s).
        const double toleranceSeconds = 60;
        double period = Kepler.Period(26_560_000, Gm);
        Assert.Equal(86164.0905 / 2, period, toleranceSeconds);
        // Derived: the period is 2 pi sqrt(a^3 / GM).
        Assert.Equal(2 * Math.PI * Math.Sqrt(Math.Pow(26_560_000, 3) / Gm), period, 1e-6);
    }

    [Fact]
    public void Speed_on_a_circular_26560_km_orbit_is_about_3_87_km_per_s()
    {
        // Common practice: GPS satellites move at about 3.87 km/s (about 14,000 km/h).
        const double toleranceMetersPerSecond = 50;
        var el = new KeplerElements(26_560_000, 0, 0.96, 1.0, 0.0, 2.0);
        Kepler.StateInertial(el, 1234.0, Gm, out Vec3 r, out Vec3 v, out _);
        Assert.Equal(3870, v.Norm, toleranceMetersPerSecond);
        Assert.Equal(26_560_000, r.Norm, 1e-6);
    }

    [Fact]
    public void Energy_and_angular_momentum_are_conserved_along_an_eccentric_orbit()
    {
        // Two-body invariants (common practice): v^2/2 - GM/r = -GM/(2a) (vis-viva) and h = r x v constant.
        const double relativeTolerance = 1e-9;
        var el = new KeplerElements(26_560_000, 0.7, 1.1, 0.4, 2.2, 0.3);
        double expectedEnergy = -Gm / (2 * el.SemiMajorAxisMeters);
        Kepler.StateInertial(el, 0, Gm, out Vec3 r0, out Vec3 v0, out _);
        Vec3 h0 = Vec3.Cross(r0, v0);
        double period = Kepler.Period(el.SemiMajorAxisMeters, Gm);
        for (int i = 0; i <= 200; i++)
        {
            double t = i * period / 137.0;
            Kepler.StateInertial(el, t, Gm, out Vec3 r, out Vec3 v, out _);
            double energy = Vec3.Dot(v, v) / 2 - Gm / r.Norm;
            Assert.Equal(0.0, (energy - expectedEnergy) / Math.Abs(expectedEnergy), relativeTolerance);
            Assert.Equal(0.0, (Vec3.Cross(r, v) - h0).Norm / h0.Norm, relativeTolerance);
        }
    }

    [Fact]
    public void Velocity_is_the_time_derivative_of_position()
    {
        // Derived: central difference (r(t+1) - r(t-1)) / 2 s; its error is about (1 s)^2 / 6 * |jerk| < 1e-4 m/s here
        // (|jerk| ~ GM n / r^2 <= 2e-4 m/s^3 at perigee of this orbit).
        const double toleranceMetersPerSecond = 1e-4;
        var el = new KeplerElements(26_560_000, 0.3, 0.9, 5.0, 1.0, 0.1);
        foreach (double t in new[] { 0.0, 3000.0, 17000.0, 40000.0 })
        {
            Kepler.StateInertial(el, t - 1, Gm, out Vec3 rm, out _, out _);
            Kepler.StateInertial(el, t + 1, Gm, out Vec3 rp, out _, out _);
            Kepler.StateInertial(el, t, Gm, out _, out Vec3 v, out _);
            Assert.Equal(0.0, ((rp - rm) / 2.0 - v).Norm, toleranceMetersPerSecond);
        }
    }

    [Fact]
    public void Elements_place_the_orbit_plane_and_perigee_where_they_say()
    {
        // Definitions of the classical elements (common practice): h = r x v points at inclination i from z,
        // the ascending node z x h lies at RAAN from x, and at M = 0 the satellite is at perigee a (1 - e),
        // at angle omega from the node inside the plane.
        const double angleToleranceRad = 1e-12;
        const double toleranceMeters = 1e-6;
        var el = new KeplerElements(20_000_000, 0.2, 0.95, 2.5, 0.8, 0.0);
        Kepler.StateInertial(el, 0, Gm, out Vec3 r, out Vec3 v, out double bigE);
        Vec3 h = Vec3.Cross(r, v);
        Assert.Equal(el.InclinationRad, Math.Acos(h.Z / h.Norm), angleToleranceRad);
        Vec3 node = Vec3.Cross(new Vec3(0, 0, 1), h).Unit;
        Assert.Equal(el.RaanRad, Math.Atan2(node.Y, node.X), angleToleranceRad);
        Assert.Equal(20_000_000 * 0.8, r.Norm, toleranceMeters);
        Assert.Equal(el.ArgumentOfPerigeeRad, Math.Acos(Vec3.Dot(node, r.Unit)), angleToleranceRad);
        Assert.True(r.Z > 0, "perigee at omega = 0.8 rad past the ascending node is north of the equator");
        Assert.Equal(0.0, bigE);
    }

    [Fact]
    public void Zero_elements_start_on_the_inertial_x_axis_moving_along_y()
    {
        // Derived: i = RAAN = omega = M0 = 0 and e = 0 put the satellite at (a, 0, 0) with v = (0, sqrt(GM/a), 0).
        const double toleranceMeters = 1e-6;
        Kepler.StateInertial(new KeplerElements(7_000_000, 0, 0, 0, 0, 0), 0, Gm, out Vec3 r, out Vec3 v, out _);
        Assert.Equal(0.0, (r - new Vec3(7_000_000, 0, 0)).Norm, toleranceMeters);
        Assert.Equal(0.0, (v - new Vec3(0, Math.Sqrt(Gm / 7_000_000), 0)).Norm, 1e-9);
    }
}

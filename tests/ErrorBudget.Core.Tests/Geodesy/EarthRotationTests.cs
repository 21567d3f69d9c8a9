using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Tests.Geodesy;

public class EarthRotationTests
{
    private const double AngleToleranceRad = 1e-12;

    [Fact]
    public void Earth_rotation_angle_at_J2000_is_the_constant_term()
    {
        // IERS Conventions (2010) eq. (5.15): at JD_UT1 = 2451545.0, ERA = 2 pi * 0.7790572732640.
        double era = EarthRotation.EarthRotationAngle(new DateTimeOffset(2000, 1, 1, 12, 0, 0, TimeSpan.Zero));
        Assert.Equal(2 * Math.PI * 0.7790572732640, era, AngleToleranceRad);
    }

    [Fact]
    public void One_day_later_the_angle_advances_by_the_excess_over_one_turn()
    {
        // Derived from IERS Conventions (2010) eq. (5.15): one UT1 day adds 2 pi * 0.00273781191135448 modulo 2 pi.
        var t0 = new DateTimeOffset(2031, 6, 1, 0, 0, 0, TimeSpan.Zero);
        double d = EarthRotation.EarthRotationAngle(t0.AddDays(1)) - EarthRotation.EarthRotationAngle(t0);
        double wrapped = Math.IEEERemainder(d, 2 * Math.PI);
        Assert.Equal(2 * Math.PI * 0.00273781191135448, wrapped, 1e-10);
    }

    [Fact]
    public void Earth_rotation_angle_is_in_zero_to_two_pi_and_honours_the_offset()
    {
        // Convention stated on EarthRotationAngle: [0, 2pi); the instant, not the local offset, matters.
        var utc = new DateTimeOffset(2031, 6, 1, 0, 0, 0, TimeSpan.Zero);
        double era = EarthRotation.EarthRotationAngle(utc);
        Assert.InRange(era, 0.0, Math.BitDecrement(2 * Math.PI));
        Assert.Equal(era, EarthRotation.EarthRotationAngle(utc.ToOffset(TimeSpan.FromHours(5))));
    }

    [Fact]
    public void Inertial_to_earth_fixed_rotates_by_minus_the_angle()
    {
        // Sign convention of the method: a fixed inertial x axis appears at longitude -angle in ECEF.
        const double toleranceMeters = 1e-9;
        Vec3 r = EarthRotation.InertialToEarthFixed(new Vec3(1, 0, 5), Math.PI / 2);
        Assert.Equal(0.0, r.X, toleranceMeters);
        Assert.Equal(-1.0, r.Y, toleranceMeters);
        Assert.Equal(5.0, r.Z, toleranceMeters);
        Vec3 q = EarthRotation.InertialToEarthFixed(new Vec3(3, 4, 0), 0.7);
        Assert.Equal(5.0, q.Norm, toleranceMeters);
        Assert.Equal(3 * Math.Cos(0.7) + 4 * Math.Sin(0.7), q.X, toleranceMeters);
        Assert.Equal(-3 * Math.Sin(0.7) + 4 * Math.Cos(0.7), q.Y, toleranceMeters);
    }
}

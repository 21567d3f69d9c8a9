using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Tests.Geodesy;

public class EnuFrameTests
{
    private const double UnitTolerance = 1e-12;

    public static TheoryData<double, double> Origins => new()
    {
        { 0, 0 }, { 37.4, -122.1 }, { -33.9, 151.2 }, { 89.9999, 45 }, { -60, 179.9 }, { 90, 10 },
    };

    [Theory]
    [MemberData(nameof(Origins))]
    public void Up_equals_the_ellipsoid_normal(double latDeg, double lonDeg)
    {
        // Derived: the outward normal of x^2/a^2 + y^2/a^2 + z^2/b^2 = 1 is the gradient (x/a^2, y/a^2, z/b^2).
        EnuFrame f = EnuFrame.At(Geodetic.FromDegrees(latDeg, lonDeg, 0));
        double a2 = Wgs84.SemiMajorAxisMeters * Wgs84.SemiMajorAxisMeters;
        double b2 = Wgs84.SemiMinorAxisMeters * Wgs84.SemiMinorAxisMeters;
        Vec3 normal = new Vec3(f.Origin.X / a2, f.Origin.Y / a2, f.Origin.Z / b2).Unit;
        Assert.Equal(0.0, (f.Up - normal).Norm, UnitTolerance);
    }

    [Theory]
    [MemberData(nameof(Origins))]
    public void East_is_horizontal_and_the_frame_is_right_handed_orthonormal(double latDeg, double lonDeg)
    {
        // Derived from the definition of ENU (common practice): E, N, U orthonormal, E x N = U, East has no z.
        EnuFrame f = EnuFrame.At(Geodetic.FromDegrees(latDeg, lonDeg, 500));
        Assert.Equal(0.0, f.East.Z, UnitTolerance);
        Assert.Equal(0.0, Vec3.Dot(f.East, f.Up), UnitTolerance);
        Assert.Equal(0.0, Vec3.Dot(f.East, f.North), UnitTolerance);
        Assert.Equal(0.0, Vec3.Dot(f.North, f.Up), UnitTolerance);
        Assert.Equal(1.0, f.East.Norm, UnitTolerance);
        Assert.Equal(1.0, f.North.Norm, UnitTolerance);
        Assert.Equal(1.0, f.Up.Norm, UnitTolerance);
        Assert.Equal(0.0, (Vec3.Cross(f.East, f.North) - f.Up).Norm, UnitTolerance);
    }

    [Fact]
    public void North_points_toward_the_pole_and_east_toward_increasing_longitude()
    {
        // Derived: moving north raises z at mid-latitudes; moving east from lon 0 raises y.
        EnuFrame f = EnuFrame.At(Geodetic.FromDegrees(45, 0, 0));
        Assert.True(f.North.Z > 0.7, $"North.Z = {f.North.Z}");
        Assert.Equal(1.0, f.East.Y, UnitTolerance);
    }

    [Fact]
    public void Enu_and_ecef_delta_are_inverse()
    {
        // Derived: the rotation is orthogonal, so ToEcefDelta(ToEnu(d)) = d.
        const double toleranceMeters = 1e-6;
        EnuFrame f = EnuFrame.At(Geodetic.FromDegrees(-12.5, 77.7, 300));
        var d = new Vec3(1.2e7, -3.4e6, 2.0e7);
        Assert.Equal(0.0, (f.ToEcefDelta(f.ToEnu(d)) - d).Norm, toleranceMeters);
        var enu = new Vec3(10, 20, 30);
        Vec3 ecefDelta = f.ToEcefDelta(enu);
        Assert.Equal(10.0, Vec3.Dot(ecefDelta, f.East), toleranceMeters);
        Assert.Equal(20.0, Vec3.Dot(ecefDelta, f.North), toleranceMeters);
        Assert.Equal(30.0, Vec3.Dot(ecefDelta, f.Up), toleranceMeters);
    }

    [Fact]
    public void Point_higher_on_the_same_normal_is_at_elevation_90_degrees()
    {
        // Derived: the geodetic point (lat, lon, h + 20,000 km) lies on the same normal, straight above.
        const double angleToleranceRad = 1e-9;
        Geodetic origin = Geodetic.FromDegrees(51.5, -0.1, 45);
        EnuFrame f = EnuFrame.At(origin);
        Vec3 above = GeodeticConversion.ToEcef(origin with { HeightMeters = 20_000_045 });
        LookAngles.FromEnu(f.ToEnu(above - f.Origin), out double el, out _);
        Assert.Equal(Math.PI / 2, el, angleToleranceRad);
    }

    [Fact]
    public void Point_due_north_on_the_horizon_has_azimuth_0_and_elevation_0()
    {
        // Derived: a point along the local North vector is horizontal and due north.
        const double angleToleranceRad = 1e-12;
        EnuFrame f = EnuFrame.At(Geodetic.FromDegrees(-40, 100, 10));
        Vec3 target = f.Origin + 5_000_000.0 * f.North;
        LookAngles.FromEnu(f.ToEnu(target - f.Origin), out double el, out double az);
        Assert.Equal(0.0, el, angleToleranceRad);
        Assert.True(az < angleToleranceRad || az > 2 * Math.PI - angleToleranceRad, $"az = {az}");
    }
}

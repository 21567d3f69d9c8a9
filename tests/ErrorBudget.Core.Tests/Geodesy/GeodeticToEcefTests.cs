using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Tests.Geodesy;

public class GeodeticToEcefTests
{
    private const double ToleranceMeters = 1e-6;

    [Fact]
    public void Equator_at_zero_longitude_and_height_is_the_semi_major_axis_on_x()
    {
        // Derived from the definition of a: the equator is the circle of radius a.
        Vec3 p = GeodeticConversion.ToEcef(Geodetic.FromDegrees(0, 0, 0));
        Assert.Equal(Wgs84.SemiMajorAxisMeters, p.X, ToleranceMeters);
        Assert.Equal(0.0, p.Y, ToleranceMeters);
        Assert.Equal(0.0, p.Z, ToleranceMeters);
    }

    [Fact]
    public void North_pole_at_zero_height_is_the_semi_minor_axis_on_z()
    {
        // Derived from the definition of b (NIMA TR8350.2 b = 6356752.3142 m).
        Vec3 p = GeodeticConversion.ToEcef(Geodetic.FromDegrees(90, 0, 0));
        Assert.Equal(0.0, p.X, ToleranceMeters);
        Assert.Equal(0.0, p.Y, ToleranceMeters);
        Assert.Equal(6356752.3142, p.Z, 1e-4);
    }

    [Fact]
    public void Latitude_45_matches_the_closed_form()
    {
        // Closed form (common practice): N = a / sqrt(1 - e^2 sin^2 phi), X = (N + h) cos phi cos lambda,
        // Y = (N + h) cos phi sin lambda, Z = (N (1 - e^2) + h) sin phi. Written out independently here.
        double phi = Math.PI / 4, lambda = 30.0 * Math.PI / 180.0, h = 1234.5;
        double a = 6378137.0, e2 = 6.69437999014e-3;
        double n = a / Math.Sqrt(1 - e2 * 0.5); // sin^2 45 deg = 1/2
        double x = (n + h) * Math.Sqrt(0.5) * Math.Cos(lambda);
        double y = (n + h) * Math.Sqrt(0.5) * Math.Sin(lambda);
        double z = (n * (1 - e2) + h) * Math.Sqrt(0.5);

        Vec3 p = GeodeticConversion.ToEcef(new Geodetic(phi, lambda, h));

        // e^2 is given to 12 significant digits, which moves N by < 1e-6 m.
        Assert.Equal(x, p.X, ToleranceMeters);
        Assert.Equal(y, p.Y, ToleranceMeters);
        Assert.Equal(z, p.Z, ToleranceMeters);
    }
}

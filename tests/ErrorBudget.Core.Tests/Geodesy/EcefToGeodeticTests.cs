using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Tests.Geodesy;

public class EcefToGeodeticTests
{
    private const double AngleToleranceRad = 1e-9;
    private const double HeightToleranceMeters = 1e-6;
    private const double PositionToleranceMeters = 1e-6;

    public static TheoryData<double> Latitudes => new()
    {
        -90, -89.9999, -89, -75, -45, -30, -10, -0.001, 0, 0.001, 10, 33.3, 45, 60, 80, 89, 89.9999, 90,
    };

    [Theory]
    [MemberData(nameof(Latitudes))]
    public void Geodetic_to_ecef_to_geodetic_round_trips_from_below_the_ellipsoid_to_beyond_geo(double latDeg)
    {
        // Self-consistency (derived from ToEcef's closed form): FromEcef must invert it.
        double[] longitudes = { -180, -179.5, -120, -45, 0, 0.5, 90, 135, 179.9999 };
        double[] heights = { -100, 0, 1, 1000, 20_000_000, 35_786_000, 40_000_000 };
        foreach (double lonDeg in longitudes)
        {
            foreach (double h in heights)
            {
                Geodetic g = Geodetic.FromDegrees(latDeg, lonDeg, h);
                Vec3 ecef = GeodeticConversion.ToEcef(g);
                Geodetic back = GeodeticConversion.FromEcef(ecef);

                Assert.Equal(g.LatitudeRad, back.LatitudeRad, AngleToleranceRad);
                Assert.Equal(g.HeightMeters, back.HeightMeters, HeightToleranceMeters);
                if (Math.Abs(latDeg) < 90)
                {
                    // Longitude is undefined on the polar axis; everywhere else it must come back.
                    double dLon = Math.IEEERemainder(back.LongitudeRad - g.LongitudeRad, 2 * Math.PI);
                    Assert.Equal(0.0, dLon, AngleToleranceRad);
                }

                Vec3 again = GeodeticConversion.ToEcef(back);
                Assert.Equal(0.0, (again - ecef).Norm, PositionToleranceMeters);
            }
        }
    }

    [Fact]
    public void Point_on_the_polar_axis_gives_latitude_90_and_height_above_b()
    {
        // Derived: on the z axis the height is |Z| - b (NIMA TR8350.2 b).
        Geodetic g = GeodeticConversion.FromEcef(new Vec3(0, 0, -7_000_000));
        Assert.Equal(-Math.PI / 2, g.LatitudeRad, AngleToleranceRad);
        Assert.Equal(7_000_000 - 6356752.3142, g.HeightMeters, 1e-4);
        Assert.Equal(0.0, g.LongitudeRad);
    }

    [Fact]
    public void Longitude_comes_back_in_minus_pi_to_pi()
    {
        // Convention stated on FromEcef: longitude in (-pi, pi].
        Geodetic g = GeodeticConversion.FromEcef(GeodeticConversion.ToEcef(Geodetic.FromDegrees(10, 270, 0)));
        Assert.Equal(-Math.PI / 2, g.LongitudeRad, AngleToleranceRad);
    }
}

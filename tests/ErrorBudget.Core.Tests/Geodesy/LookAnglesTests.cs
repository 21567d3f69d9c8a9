using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Tests.Geodesy;

public class LookAnglesTests
{
    private const double AngleToleranceRad = 1e-12;

    [Theory]
    [InlineData(0, 1, 0)]
    [InlineData(1, 1, 45)]
    [InlineData(1, 0, 90)]
    [InlineData(0, -1, 180)]
    [InlineData(-1, 0, 270)]
    [InlineData(-1, 1, 315)]
    public void Azimuth_is_clockwise_from_north(double east, double north, double expectedDeg)
    {
        // Convention (common practice): azimuth measured from North towards East.
        LookAngles.FromEnu(new Vec3(east, north, 0), out double el, out double az);
        Assert.Equal(expectedDeg * Math.PI / 180, az, AngleToleranceRad);
        Assert.Equal(0.0, el, AngleToleranceRad);
    }

    [Fact]
    public void Tiny_westward_component_keeps_azimuth_below_two_pi()
    {
        // Convention stated on FromEnu: azimuth in [0, 2pi); -1e-300 would round to exactly 2pi.
        LookAngles.FromEnu(new Vec3(-1e-300, 1, 0), out _, out double az);
        Assert.InRange(az, 0.0, Math.BitDecrement(2 * Math.PI));
    }

    [Theory]
    [InlineData(0, 0, 1, 90)]
    [InlineData(0, 0, -1, -90)]
    [InlineData(1, 0, 1, 45)]
    [InlineData(0, -3, -3, -45)]
    public void Elevation_is_the_angle_above_the_horizontal_plane(double east, double north, double up, double expectedDeg)
    {
        // Derived: elevation = atan2(up, horizontal distance).
        LookAngles.FromEnu(new Vec3(east, north, up), out double el, out _);
        Assert.Equal(expectedDeg * Math.PI / 180, el, AngleToleranceRad);
    }
}

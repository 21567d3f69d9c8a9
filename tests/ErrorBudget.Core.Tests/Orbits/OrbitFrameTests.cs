using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;

namespace ErrorBudget.Core.Tests.Orbits;

public class OrbitFrameTests
{
    private const double UnitTolerance = 1e-12;

    [Fact]
    public void Radial_along_cross_is_a_right_handed_orthonormal_frame()
    {
        // Definition (common practice): radial = r/|r|, cross = orbit normal, along = cross x radial; R x A = C.
        var el = new KeplerElements(26_560_000, 0.3, 0.96, 1.0, 2.0, 0.5);
        Kepler.StateInertial(el, 777, Wgs84.GravitationalParameter, out Vec3 r, out Vec3 v, out _);
        (Vec3 radial, Vec3 along, Vec3 cross) = OrbitFrame.RadialAlongCross(r, v);
        Assert.Equal(1.0, radial.Norm, UnitTolerance);
        Assert.Equal(1.0, along.Norm, UnitTolerance);
        Assert.Equal(1.0, cross.Norm, UnitTolerance);
        Assert.Equal(0.0, Vec3.Dot(radial, along), UnitTolerance);
        Assert.Equal(0.0, Vec3.Dot(radial, cross), UnitTolerance);
        Assert.Equal(0.0, Vec3.Dot(along, cross), UnitTolerance);
        Assert.Equal(0.0, (Vec3.Cross(radial, along) - cross).Norm, UnitTolerance);
        Assert.Equal(0.0, (radial - r.Unit).Norm, UnitTolerance);
        Assert.True(Vec3.Dot(along, v) > 0, "along-track points forward");
    }

    [Fact]
    public void Circular_equatorial_orbit_gives_x_y_z()
    {
        // Derived: r on x, v on y gives radial x, along y, cross z.
        (Vec3 radial, Vec3 along, Vec3 cross) = OrbitFrame.RadialAlongCross(new Vec3(7e6, 0, 0), new Vec3(0, 7.5e3, 0));
        Assert.Equal(0.0, (radial - new Vec3(1, 0, 0)).Norm, UnitTolerance);
        Assert.Equal(0.0, (along - new Vec3(0, 1, 0)).Norm, UnitTolerance);
        Assert.Equal(0.0, (cross - new Vec3(0, 0, 1)).Norm, UnitTolerance);
    }
}

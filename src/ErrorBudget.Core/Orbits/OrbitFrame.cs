using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Orbits;

/// <summary>The satellite's radial / along-track / cross-track frame (orbit errors are expressed in it).</summary>
public static class OrbitFrame
{
    /// <summary>
    /// Unit vectors from position r and velocity v (same frame): radial = r / |r|, cross = (r x v) / |r x v|
    /// (orbit normal), along = cross x radial (in the orbit plane, along v for a circular orbit). Right-handed:
    /// radial x along = cross. Range: r and v not parallel.
    /// </summary>
    public static (Vec3 radial, Vec3 along, Vec3 cross) RadialAlongCross(Vec3 r, Vec3 v)
    {
        Vec3 radial = r.Unit;
        Vec3 cross = Vec3.Cross(r, v).Unit;
        Vec3 along = Vec3.Cross(cross, radial);
        return (radial, along, cross);
    }
}

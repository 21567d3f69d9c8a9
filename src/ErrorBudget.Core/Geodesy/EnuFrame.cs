using System.Runtime.CompilerServices;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Geodesy;

/// <summary>
/// Local East-North-Up frame at a geodetic origin. Up is the ellipsoid normal (geodetic vertical), East
/// is horizontal and points to increasing longitude, North completes a right-handed set (E x N = U).
/// All vectors are ECEF; distances in metres.
/// </summary>
public readonly struct EnuFrame
{
    private EnuFrame(Vec3 origin, Vec3 east, Vec3 north, Vec3 up)
    {
        Origin = origin;
        East = east;
        North = north;
        Up = up;
    }

    /// <summary>ECEF position of the frame's origin, metres.</summary>
    public Vec3 Origin { get; }

    /// <summary>Unit East vector in ECEF: (-sin lambda, cos lambda, 0).</summary>
    public Vec3 East { get; }

    /// <summary>Unit North vector in ECEF: (-sin phi cos lambda, -sin phi sin lambda, cos phi).</summary>
    public Vec3 North { get; }

    /// <summary>Unit Up vector (ellipsoid normal) in ECEF: (cos phi cos lambda, cos phi sin lambda, sin phi).</summary>
    public Vec3 Up { get; }

    /// <summary>Builds the frame at <paramref name="origin"/>. At a pole East follows the given longitude.</summary>
    public static EnuFrame At(Geodetic origin)
    {
        double sinLat = Math.Sin(origin.LatitudeRad), cosLat = Math.Cos(origin.LatitudeRad);
        double sinLon = Math.Sin(origin.LongitudeRad), cosLon = Math.Cos(origin.LongitudeRad);
        return new EnuFrame(
            GeodeticConversion.ToEcef(origin),
            new Vec3(-sinLon, cosLon, 0.0),
            new Vec3(-sinLat * cosLon, -sinLat * sinLon, cosLat),
            new Vec3(cosLat * cosLon, cosLat * sinLon, sinLat));
    }

    /// <summary>Components (east, north, up) of an ECEF difference vector (e.g. satellite minus origin).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public Vec3 ToEnu(Vec3 ecefDelta) =>
        new(Vec3.Dot(East, ecefDelta), Vec3.Dot(North, ecefDelta), Vec3.Dot(Up, ecefDelta));

    /// <summary>ECEF difference vector from (east, north, up) components; inverse of <see cref="ToEnu"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public Vec3 ToEcefDelta(Vec3 enu) =>
        new(East.X * enu.X + North.X * enu.Y + Up.X * enu.Z,
            East.Y * enu.X + North.Y * enu.Y + Up.Y * enu.Z,
            East.Z * enu.X + North.Z * enu.Y + Up.Z * enu.Z);
}

using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Geodesy;

/// <summary>
/// Earth rotation between the inertial frame of the orbits and ECEF. The model is a pure rotation about
/// the z axis (no precession, nutation or polar motion), enough for error budgets over days.
/// </summary>
public static class EarthRotation
{
    private const double TwoPi = 2.0 * Math.PI;
    // JD 2451545.0 = 2000-01-01T12:00:00 (read as UT1 by eq. 5.15).
    private static readonly long J2000Ticks = new DateTime(2000, 1, 1, 12, 0, 0, DateTimeKind.Utc).Ticks;

    /// <summary>
    /// Earth rotation angle, radians in [0, 2pi), by IERS Conventions (2010) eq. (5.15):
    /// ERA = 2pi (0.7790572732640 + 1.00273781191135448 (JD_UT1 - 2451545.0)).
    /// UT1 is taken equal to UTC; |UT1 - UTC| &lt; 0.9 s, i.e. at most 6.6e-5 rad (about 420 m at the equator),
    /// a constant offset of the whole sky that error budgets do not see.
    /// </summary>
    public static double EarthRotationAngle(DateTimeOffset utc)
    {
        long ticks = utc.UtcTicks - J2000Ticks;
        long wholeDays = Math.DivRem(ticks, TimeSpan.TicksPerDay, out long remainderTicks);
        double dayFraction = (double)remainderTicks / TimeSpan.TicksPerDay;
        double daysUt1 = wholeDays + dayFraction;

        // Split 1.00273781191135448 Du = Du + 0.00273781191135448 Du and drop whole turns for precision
        // (the form recommended beside eq. 5.15).
        double turns = 0.7790572732640 + 0.00273781191135448 * daysUt1 + dayFraction;
        turns -= Math.Floor(turns);
        double era = TwoPi * turns;
        return era >= TwoPi ? 0.0 : era;
    }

    /// <summary>
    /// Rotates an inertial vector into the Earth-fixed frame, a rotation about z by -<paramref name="angleRad"/>:
    /// x' = cos a x + sin a y, y' = -sin a x + cos a y, z' = z.
    /// </summary>
    public static Vec3 InertialToEarthFixed(Vec3 inertial, double angleRad)
    {
        (double sin, double cos) = Math.SinCos(angleRad);
        return InertialToEarthFixed(inertial, cos, sin);
    }

    /// <summary>Same rotation with the angle's cosine and sine precomputed (hot loops over satellites).</summary>
    internal static Vec3 InertialToEarthFixed(Vec3 inertial, double cosAngle, double sinAngle) =>
        new(cosAngle * inertial.X + sinAngle * inertial.Y,
            -sinAngle * inertial.X + cosAngle * inertial.Y,
            inertial.Z);
}

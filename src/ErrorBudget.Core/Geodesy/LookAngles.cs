using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Geodesy;

/// <summary>Elevation and azimuth of a line of sight given in local ENU components.</summary>
public static class LookAngles
{
    private const double TwoPi = 2.0 * Math.PI;

    /// <summary>
    /// Elevation above the local horizontal plane, radians in [-pi/2, pi/2] (positive up), and azimuth
    /// clockwise from North towards East, radians in [0, 2pi). A zero vector gives 0 and 0; straight up or
    /// down gives azimuth 0.
    /// </summary>
    public static void FromEnu(Vec3 enu, out double elevationRad, out double azimuthRad)
    {
        double horizontal = Math.Sqrt(enu.X * enu.X + enu.Y * enu.Y);
        elevationRad = Math.Atan2(enu.Z, horizontal);
        double az = Math.Atan2(enu.X, enu.Y);
        if (az < 0.0)
        {
            az += TwoPi;
            // A tiny negative angle rounds to exactly 2pi; keep the half-open range.
            if (az >= TwoPi)
            {
                az = 0.0;
            }
        }

        azimuthRad = az;
    }
}

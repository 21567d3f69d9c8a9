using System.Runtime.CompilerServices;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// Sagnac (Earth-rotation) correction for ranges computed in ECEF. With the satellite's ECEF position at transmit
/// time r_s and the receiver's ECEF position at receive time r_r, the flight path in an inertial frame is
/// c tau = |r_s - r_r| + c DelaySeconds(r_s, r_r), with DelaySeconds = (omegaE / c^2)(x_s y_r - y_s x_r)
/// = 2 omegaE A_z / c^2 (A_z: signed equatorial projection of the area of the triangle Earth centre, satellite,
/// receiver). Sign: negative when the satellite lies east of the receiver (the receiver moves toward it during the
/// flight), positive to the west. The neglected terms are second order in omegaE tau, below 0.5 mm up to GEO.
/// </summary>
public static class Sagnac
{
    /// <summary>
    /// (omegaE / c^2)(x_s y_r - y_s x_r), seconds; add c times it to the ECEF range. Positions ECEF in metres,
    /// omegaE in rad/s (the same rate as the ECEF frame's rotation).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double DelaySeconds(Vec3 satelliteEcef, Vec3 receiverEcef, double omegaE) =>
        omegaE * (satelliteEcef.X * receiverEcef.Y - satelliteEcef.Y * receiverEcef.X) / RelativityConstants.SpeedOfLightSquared;

    /// <summary>
    /// Bound on |DelaySeconds| for a satellite at geocentric radius r_s above the receiver's geocentric horizon
    /// ((r_s - r_r) . r_r &gt;= 0), receiver at geocentric radius r_r: omegaE r_s r_r sin(gamma_max) / c^2 with
    /// cos(gamma_max) = r_r / r_s, because |x_s y_r - y_s x_r| = |(r_s x r_r)_z| &lt;= r_s r_r sin(gamma) and the
    /// horizon limits the geocentric angle gamma to gamma_max. Reached by an equatorial receiver with an
    /// equatorial satellite on its horizon (133.4 ns for GPS). Geodetic elevation exceeds geocentric elevation by
    /// at most the 0.19 deg latitude difference, so any elevation mask of 0.2 deg or more keeps the bound valid.
    /// Seconds. Range: 0 &lt; receiverRadius &lt; satelliteRadius (metres).
    /// </summary>
    public static double MaximumMagnitudeSeconds(double satelliteRadius, double receiverRadius, double omegaE)
    {
        if (!(receiverRadius > 0.0 && receiverRadius < satelliteRadius))
        {
            throw new ArgumentOutOfRangeException(nameof(receiverRadius), receiverRadius, "Need 0 < receiverRadius < satelliteRadius.");
        }

        double ratio = receiverRadius / satelliteRadius;
        double sinGammaMax = Math.Sqrt(1.0 - ratio * ratio);
        return Math.Abs(omegaE) * satelliteRadius * receiverRadius * sinGammaMax / RelativityConstants.SpeedOfLightSquared;
    }
}

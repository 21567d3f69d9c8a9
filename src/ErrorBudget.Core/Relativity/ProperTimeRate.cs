using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// Instantaneous fractional rate of a satellite's proper time relative to TT, monopole field only:
/// y(t) = L_G - GM/(r c^2) - v^2/(2 c^2). Positive y: the satellite clock runs fast.
/// Its time average over a Kepler orbit is <see cref="SecularRate.Net"/>; the integral of the rest is
/// <see cref="EccentricityTerm.Seconds"/>.
/// </summary>
public static class ProperTimeRate
{
    /// <summary>
    /// y for a geocentric position (m) and velocity (m/s) in a non-rotating (inertial) frame; an ECEF velocity
    /// would miss the Earth-rotation part of v. gm in m^3/s^2. Unitless.
    /// </summary>
    public static double Fractional(Vec3 positionInertial, Vec3 velocityInertial, double gm) =>
        RelativityConstants.LG
        - (gm / positionInertial.Norm + 0.5 * Vec3.Dot(velocityInertial, velocityInertial)) / RelativityConstants.SpeedOfLightSquared;
}

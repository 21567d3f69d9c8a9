using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// Shapiro (gravitational path) delay of the signal in the Earth's field, as an excess range in metres (always
/// positive: the signal arrives later than |r_s - r_r| / c). Navipedia "Relativistic Path Range Effect", eq. (1);
/// IERS Conventions 2010 eq. (11.17) with gamma = 1. Under 2 cm for ground users of GPS-like orbits
/// (12.7 mm at zenith, 18.7 mm on the horizon); larger for higher orbits (about 23 mm from GEO on the horizon).
/// </summary>
public static class Shapiro
{
    /// <summary>
    /// (2 GM/c^2) ln((r_s + r_r + rho)/(r_s + r_r - rho)), metres. r_s, r_r geocentric radii (m), rho the
    /// satellite-receiver range (m), gm in m^3/s^2. Range: 0 &lt;= rho &lt; r_s + r_r.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double DelayMeters(double satelliteRadius, double receiverRadius, double range, double gm)
    {
        double sum = satelliteRadius + receiverRadius;
        return 2.0 * gm / RelativityConstants.SpeedOfLightSquared * Math.Log((sum + range) / (sum - range));
    }
}

using System.Runtime.CompilerServices;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// Periodic relativistic clock term of an eccentric orbit, Delta t_r = F e sqrt(A) sin E (IS-GPS-200,
/// 20.3.3.3.3.1), in seconds. Sign: Delta t_r is how far the satellite clock reads AHEAD of a clock running at the
/// orbit-averaged rate (negative just after perigee, where the clock has been running slow); the user ADDS it to
/// the polynomial satellite clock correction, Delta t_sv = a_f0 + a_f1 dt + a_f2 dt^2 + Delta t_r, t = t_sv - Delta t_sv.
/// Mean zero over an orbit in time; period = orbital period. The constant F uses the GPS GM, so the forms agree
/// exactly only for orbits propagated with that GM.
/// </summary>
public static class EccentricityTerm
{
    /// <summary>
    /// F e sqrt(A) sin E, seconds. e unitless in [0, 1), A = semi-major axis in metres, E = eccentric anomaly in radians.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Seconds(double e, double semiMajorAxisMeters, double eccentricAnomalyRad) =>
        RelativityConstants.F * e * Math.Sqrt(semiMajorAxisMeters) * Math.Sin(eccentricAnomalyRad);

    /// <summary>
    /// The equivalent form -2 (r . v)/c^2, seconds (r . v = sqrt(GM a) e sin E on a Kepler orbit). Position in metres,
    /// velocity in m/s, both inertial, or both ECEF: r . (omega x r) = 0, so the Earth-rotation part of the velocity
    /// drops out.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double SecondsFromState(Vec3 r, Vec3 v) =>
        -2.0 * Vec3.Dot(r, v) / RelativityConstants.SpeedOfLightSquared;

    /// <summary>Peak magnitude |F| e sqrt(a), seconds (22.9 ns for e = 0.01 at GPS altitude).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double AmplitudeSeconds(double e, double semiMajorAxisMeters) =>
        -RelativityConstants.F * e * Math.Sqrt(semiMajorAxisMeters);
}

using System.Runtime.CompilerServices;
using ErrorBudget.Core.Geodesy;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// Secular (orbit-averaged) fractional frequency offset y of a satellite clock relative to a clock on the geoid
/// (i.e. relative to TT). Sign: y &gt; 0 means the satellite clock runs fast, gaining y seconds per second.
/// <para>
/// Only the monopole field is modelled. The offset of the proper-time rate is
/// y(t) = (W0 - GM/r)/c^2 - v^2/(2c^2) (see <see cref="ProperTimeRate"/>). For an eccentric orbit the time average
/// depends on a only: energy conservation v^2/2 - GM/r = -GM/(2a) together with the time average &lt;GM/r&gt; = GM/a
/// gives &lt;v^2&gt; = GM/a, so &lt;y&gt; = L_G - 3GM/(2 a c^2) for every e. What is left, y(t) - &lt;y&gt;, is purely
/// periodic with the orbital period; its integral is the eccentricity term of <see cref="EccentricityTerm"/>.
/// The J2 terms (a few parts in 1e13, Ashby LRR 2003 §5) are not included.
/// </para>
/// Inputs: a in metres (a &gt; 0), gm in m^3/s^2.
/// </summary>
public static class SecularRate
{
    private const double C2 = RelativityConstants.SpeedOfLightSquared;

    /// <summary>Gravitational (general-relativity) part (W0 - GM/a)/c^2 = L_G - GM/(a c^2), unitless; positive above the geoid.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Gravitational(double semiMajorAxisMeters, double gm) =>
        RelativityConstants.LG - gm / (semiMajorAxisMeters * C2);

    /// <summary>Velocity (special-relativity, second-order Doppler) part -&lt;v^2&gt;/(2c^2) = -GM/(2 a c^2), unitless; always negative.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Velocity(double semiMajorAxisMeters, double gm) =>
        -gm / (2.0 * semiMajorAxisMeters * C2);

    /// <summary>Net secular offset L_G - 3GM/(2 a c^2), unitless (+4.4647e-10 for GPS).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Net(double semiMajorAxisMeters, double gm) =>
        RelativityConstants.LG - 1.5 * gm / (semiMajorAxisMeters * C2);

    /// <summary>
    /// d(Net)/da = 3GM/(2 a^2 c^2), per metre of semi-major axis (9.43e-18 /m, 0.81 ns/day per km for GPS):
    /// the rate error of a clock whose factory offset was set for an orbit a few metres off.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double NetDerivativePerMeter(double semiMajorAxisMeters, double gm) =>
        1.5 * gm / (semiMajorAxisMeters * semiMajorAxisMeters * C2);

    /// <summary>Time gained per day by a clock with this fractional offset, microseconds per day (y x 86400 x 1e6).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double MicrosecondsPerDay(double fractional) => fractional * RelativityConstants.SecondsPerDay * 1e6;

    /// <summary>The same offset as a range drift, metres per day (y x c x 86400).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double RangeMetersPerDay(double fractional) =>
        fractional * PhysicalConstants.SpeedOfLight * RelativityConstants.SecondsPerDay;

    /// <summary>
    /// Frequency the satellite oscillator is set to on the ground, f0 (1 - y) in Hz with f0 = 10.23 MHz, so that it
    /// shows f0 in orbit (IS-GPS-200, 3.3.1.1: 10.2299999954326 MHz for y = 4.4647e-10). The exact f0/(1 + y) differs
    /// by f0 y^2, about 2e-12 Hz, far below the published digits.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double FactoryOffsetFrequencyHz(double fractionalOffset) =>
        RelativityConstants.NominalClockFrequencyHz * (1.0 - fractionalOffset);
}

using ErrorBudget.Core.Geodesy;

namespace ErrorBudget.Core.Relativity;

/// <summary>Constants of the relativistic clock and signal-propagation models. SI units.</summary>
public static class RelativityConstants
{
    /// <summary>
    /// L_G = 6.969290134e-10, unitless: the defining rate difference between TCG and TT (IAU 2000 Resolution B1.9;
    /// IERS Conventions 2010, ch. 10). Equals W0 / c^2 for <see cref="GeoidPotential"/>, so a clock on the geoid
    /// ticks TT.
    /// </summary>
    public const double LG = 6.969290134e-10;

    /// <summary>
    /// Gravity potential of the geoid W0 = 62,636,856.0 m^2/s^2 (the value adopted for L_G; Burša et al., J. Geodesy 2007).
    /// Includes the centrifugal potential of the rotating Earth, so a ground clock's own velocity is inside it.
    /// </summary>
    public const double GeoidPotential = 62_636_856.0;

    /// <summary>c^2, m^2/s^2.</summary>
    public const double SpeedOfLightSquared = PhysicalConstants.SpeedOfLight * PhysicalConstants.SpeedOfLight;

    /// <summary>
    /// F = -2 sqrt(mu) / c^2, s/sqrt(m), with mu the GPS user-algorithm GM (IS-GPS-200, 20.3.3.3.3.1; about
    /// -4.442807633e-10). Computed from <see cref="PhysicalConstants"/> so it cannot drift from them.
    /// </summary>
    public static readonly double F = -2.0 * Math.Sqrt(PhysicalConstants.GpsGravitationalParameter) / SpeedOfLightSquared;

    /// <summary>Nominal satellite clock (P-code chipping) frequency f0 = 10.23 MHz, in Hz (IS-GPS-200, 3.3.1.1).</summary>
    public const double NominalClockFrequencyHz = 10.23e6;

    /// <summary>Seconds in one day of 86,400 s.</summary>
    public const double SecondsPerDay = 86_400.0;
}

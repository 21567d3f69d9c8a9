namespace ErrorBudget.Core.Geodesy;

/// <summary>
/// WGS-84 ellipsoid and Earth constants. Source: NIMA TR8350.2, "Department of Defense World Geodetic
/// System 1984", 3rd edition (defining parameters a, 1/f, GM, omega; b and e^2 derived from a and f).
/// </summary>
public static class Wgs84
{
    /// <summary>Semi-major axis a, metres (NIMA TR8350.2 defining parameter).</summary>
    public const double SemiMajorAxisMeters = 6378137.0;

    /// <summary>Inverse flattening 1/f, unitless (NIMA TR8350.2 defining parameter).</summary>
    public const double InverseFlattening = 298.257223563;

    /// <summary>Flattening f = 1 / 298.257223563, unitless.</summary>
    public const double Flattening = 1.0 / InverseFlattening;

    /// <summary>Semi-minor axis b = a (1 - f), metres (derived; NIMA TR8350.2 lists 6356752.3142 m).</summary>
    public const double SemiMinorAxisMeters = SemiMajorAxisMeters * (1.0 - Flattening);

    /// <summary>First eccentricity squared e^2 = f (2 - f), unitless (derived; NIMA TR8350.2 lists 6.69437999014e-3).</summary>
    public const double FirstEccentricitySquared = Flattening * (2.0 - Flattening);

    /// <summary>Earth's gravitational constant GM including the atmosphere, m^3/s^2 (NIMA TR8350.2, current WGS-84 value).</summary>
    public const double GravitationalParameter = 3.986004418e14;

    /// <summary>Nominal mean angular velocity of the Earth, rad/s (NIMA TR8350.2 defining parameter).</summary>
    public const double EarthRotationRateRadPerSecond = 7.292115e-5;
}

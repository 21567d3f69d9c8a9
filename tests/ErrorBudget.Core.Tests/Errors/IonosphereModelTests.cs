using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Errors;

public class IonosphereModelTests
{
    private const double Deg = Math.PI / 180.0;

    [Fact]
    public void Thin_shell_obliquity_is_one_at_zenith_and_about_three_at_five_degrees()
    {
        // RTCA DO-229 appendix J thin shell, h = 350 km, R_e = 6378.1363 km (REFERENCE-VALUES check 19).
        Assert.Equal(1.0, IonosphereModel.Obliquity(90 * Deg), 1e-12);
        Assert.Equal(3.041, IonosphereModel.Obliquity(5 * Deg), 1e-3);
    }

    [Theory]
    // REFERENCE-VALUES §8 (derived from IS-GPS-200 / IS-GPS-705 frequencies): k = √(f1⁴ + f2⁴)/(f1² − f2²).
    [InlineData(FrequencyPair.L1L2, 2.978)]
    [InlineData(FrequencyPair.L1L5, 2.588)]
    public void Iono_free_noise_factor_matches_the_published_values(FrequencyPair pair, double expected)
    {
        Assert.Equal(expected, IonosphereModel.IonoFreeNoiseFactor(pair), 1e-3);
    }

    [Theory]
    // REFERENCE-VALUES §8 table (Navipedia eq. 1): a1 = γ/(γ − 1), a2 = 1/(γ − 1).
    [InlineData(FrequencyPair.L1L2, 2.5457, 1.5457)]
    [InlineData(FrequencyPair.L1L5, 2.2606, 1.2606)]
    public void Iono_free_coefficients_match_the_published_table(FrequencyPair pair, double a1Expected, double a2Expected)
    {
        (double a1, double a2) = IonosphereModel.IonoFreeCoefficients(pair);
        Assert.Equal(a1Expected, a1, 1e-4);
        Assert.Equal(a2Expected, a2, 1e-4);
        // Derived: a1 − a2 = 1, so the non-dispersive part (geometry, clocks, troposphere) passes unchanged.
        Assert.Equal(1.0, a1 - a2, 1e-14);
    }

    [Theory]
    [InlineData(FrequencyPair.L1L2, 1e16)]
    [InlineData(FrequencyPair.L1L2, 5e17)]
    [InlineData(FrequencyPair.L1L5, 3e18)]
    public void Iono_free_combination_removes_an_injected_first_order_delay(FrequencyPair pair, double tecElectronsPerSquareMeter)
    {
        // First-order group delay I = 40.3 TEC / f² m (Navipedia, ionosphere-free combination; REFERENCE-VALUES check 20).
        (double f1, double f2) = pair == FrequencyPair.L1L2 ? (1575.42e6, 1227.60e6) : (1575.42e6, 1176.45e6);
        const double nonDispersiveMeters = 1234.5;   // kept small so that rounding stays far below 1e-9 m
        double rho1 = nonDispersiveMeters + (40.3 * tecElectronsPerSquareMeter / (f1 * f1));
        double rho2 = nonDispersiveMeters + (40.3 * tecElectronsPerSquareMeter / (f2 * f2));
        (double a1, double a2) = IonosphereModel.IonoFreeCoefficients(pair);
        Assert.True(rho2 - rho1 > 0.01, "the injected delay must be visible on the raw pseudoranges");
        Assert.Equal(nonDispersiveMeters, (a1 * rho1) - (a2 * rho2), 1e-9);
    }
}

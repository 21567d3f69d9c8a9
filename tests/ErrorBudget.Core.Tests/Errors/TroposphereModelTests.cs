using ErrorBudget.Core.Errors;

namespace ErrorBudget.Core.Tests.Errors;

public class TroposphereModelTests
{
    private const double Deg = Math.PI / 180.0;

    [Fact]
    public void Mapping_is_one_at_zenith_and_about_ten_at_five_degrees()
    {
        // RTCA DO-229 appendix J via REFERENCE-VALUES check 18: m(90°) = 1.001/√1.002001 = 1.0000.
        Assert.Equal(1.0000, TroposphereModel.Mapping(90 * Deg), 1e-4);
        // Same source: m(5°) = 1.001/√(0.002001 + sin²5°) = 10.218.
        Assert.Equal(10.218, TroposphereModel.Mapping(5 * Deg), 1e-3);
    }

    [Fact]
    public void Sigma_scales_the_zenith_residual_by_the_mapping()
    {
        // REFERENCE-VALUES check 18 (derived): 0.12 m zenith (DO-229) at 5° gives 1.226 m.
        Assert.Equal(1.226, TroposphereModel.Sigma(0.12, 5 * Deg), 1e-3);
    }

    [Fact]
    public void Low_elevation_factor_applies_below_four_degrees_and_is_continuous_at_four()
    {
        // Low-elevation factor 1 + 0.015 (4° − θ)² (from memory): at 2° it is 1.06; derived from the formula.
        double s = Math.Sin(2 * Deg);
        double expected = 1.001 / Math.Sqrt(0.002001 + (s * s)) * 1.06;
        Assert.Equal(expected, TroposphereModel.Mapping(2 * Deg), 1e-9);

        // Continuity at 4°: the factor is 1 + 0.015 d² with d → 0.
        Assert.Equal(TroposphereModel.Mapping(4 * Deg), TroposphereModel.Mapping((4 * Deg) - 1e-9), 1e-6);
    }
}

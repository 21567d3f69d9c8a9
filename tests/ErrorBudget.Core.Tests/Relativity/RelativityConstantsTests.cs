using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Relativity;

namespace ErrorBudget.Core.Tests.Relativity;

public class RelativityConstantsTests
{
    [Fact]
    public void F_computed_from_the_gps_gm_and_c_is_the_published_constant()
    {
        // IS-GPS-200, 20.3.3.3.3.1: F = -2 sqrt(mu)/c^2 = -4.442807633e-10 s/sqrt(m) (REFERENCE-VALUES 1.2, suggested check 1).
        const double relativeTolerance = 1e-9;
        Assert.Equal(1.0, RelativityConstants.F / -4.442807633e-10, relativeTolerance);
    }

    [Fact]
    public void Geoid_potential_over_c_squared_is_L_G()
    {
        // IAU 2000 B1.9 / IERS Conventions 2010 ch. 10: L_G = 6.969290134e-10; W0 = 62,636,856.0 m^2/s^2 (Burša et al. 2007).
        // Derived: W0/c^2 = 6.96929013394e-10 (REFERENCE-VALUES 1.1).
        const double absoluteTolerance = 1e-18;
        Assert.Equal(RelativityConstants.LG, RelativityConstants.GeoidPotential / RelativityConstants.SpeedOfLightSquared, absoluteTolerance);
    }

    [Fact]
    public void Nominal_clock_frequency_is_10_23_MHz()
    {
        // IS-GPS-200 3.3.1.1; L1 = 154 x 10.23 MHz = 1575.42 MHz (REFERENCE-VALUES 1.1).
        Assert.Equal(10.23e6, RelativityConstants.NominalClockFrequencyHz);
        Assert.Equal(1575.42e6, 154 * RelativityConstants.NominalClockFrequencyHz, 1e-6);
        Assert.Equal(PhysicalConstants.SpeedOfLight * PhysicalConstants.SpeedOfLight, RelativityConstants.SpeedOfLightSquared);
    }
}

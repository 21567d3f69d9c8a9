using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Relativity;

namespace ErrorBudget.Core.Tests.Relativity;

public class FactoryOffsetFrequencyTests
{
    [Fact]
    public void Published_offset_gives_10_2299999954326_MHz()
    {
        // IS-GPS-200E 3.3.1.1 as quoted in REFERENCE-VALUES 1.3 (suggested check 3): 10.23 MHz (1 - 4.4647e-10) = 10.2299999954326 MHz,
        // Delta f = -4.5674e-3 Hz.
        const double toleranceHz = 1e-7;
        double f = SecularRate.FactoryOffsetFrequencyHz(4.4647e-10);
        Assert.Equal(10_229_999.9954326, f, toleranceHz);
        Assert.Equal(-4.5674e-3, f - RelativityConstants.NominalClockFrequencyHz, 1e-7);
    }

    [Fact]
    public void Computed_net_rate_gives_the_published_frequency()
    {
        // Same source; the tolerance carries the 2e-14 allowed on the net rate: 2e-14 x 10.23e6 Hz = 2e-7 Hz.
        const double toleranceHz = 2e-7;
        double net = SecularRate.Net(26_561_750, PhysicalConstants.GpsGravitationalParameter);
        Assert.Equal(10_229_999.9954326, SecularRate.FactoryOffsetFrequencyHz(net), toleranceHz);
    }

    [Fact]
    public void Older_documents_frequency_holds_to_its_printed_precision()
    {
        // ICD-GPS-200 up to D, SPS Signal Specification 1995 (REFERENCE-VALUES 1.3): 10.22999999543 MHz, printed to 1e-11 MHz = 1e-5 Hz,
        // so the value must round to it: within half a unit of the last digit.
        const double halfLastDigitHz = 0.5e-5;
        Assert.Equal(10_229_999.99543, SecularRate.FactoryOffsetFrequencyHz(4.4647e-10), halfLastDigitHz);
        // REFERENCE-VALUES 1.3 warning: the misprint 10.229999999543 MHz (an extra 9) is far off.
        Assert.True(Math.Abs(SecularRate.FactoryOffsetFrequencyHz(4.4647e-10) - 10_229_999.999543) > 1e-3);
    }

    [Fact]
    public void Ground_setting_appears_as_10_23_MHz_in_orbit()
    {
        // Derived: the orbit multiplies the ground frequency by (1 + y); f0 (1 - y)(1 + y) = f0 (1 - y^2), y^2 f0 ~ 2e-12 Hz.
        const double toleranceHz = 1e-8;
        const double y = 4.4647e-10;
        Assert.Equal(RelativityConstants.NominalClockFrequencyHz, SecularRate.FactoryOffsetFrequencyHz(y) * (1 + y), toleranceHz);
    }
}

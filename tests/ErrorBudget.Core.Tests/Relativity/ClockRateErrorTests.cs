using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Relativity;

namespace ErrorBudget.Core.Tests.Relativity;

public class ClockRateErrorTests
{
    private const double Gm = PhysicalConstants.GpsGravitationalParameter;
    private const double C = PhysicalConstants.SpeedOfLight;
    private const double Day = 86_400;

    [Fact]
    public void Missed_factory_offset_shortens_ranges_by_11_56_km_per_day()
    {
        // REFERENCE-VALUES 1.4: net +38.575 us/day = 11.56 km/day; the clock runs fast, so ranges come out short.
        const double toleranceMeters = 50;
        double residual = ClockRateError.ResidualRate(SecularRate.Net(26_561_750, Gm), 0.0);
        Assert.Equal(-11_560, ClockRateError.RangeErrorMeters(residual, Day), toleranceMeters);
        Assert.Equal(38.575e-6, ClockRateError.ClockOffsetSeconds(residual, Day), 0.005e-6);
    }

    [Fact]
    public void Offset_preset_for_an_orbit_1_km_lower_leaves_0_81_ns_per_day()
    {
        // REFERENCE-VALUES 1.4 (derived): 0.81 ns/day per km of semi-major axis; the satellite flies higher than the
        // preset assumed, so it runs fast (residual > 0) and ranges drift short by c x 0.81 ns = 0.24 m per day.
        const double relativeTolerance = 1e-4;
        const double nominal = 26_561_750;
        double residual = ClockRateError.ResidualRate(SecularRate.Net(nominal + 1000, Gm), SecularRate.Net(nominal, Gm));
        Assert.True(residual > 0);
        Assert.Equal(0.81e-9, ClockRateError.ClockOffsetSeconds(residual, Day), 0.01e-9);
        double expectedMeters = -C * SecularRate.NetDerivativePerMeter(nominal, Gm) * 1000 * Day;
        Assert.Equal(1.0, ClockRateError.RangeErrorMeters(residual, Day) / expectedMeters, relativeTolerance);
    }

    [Fact]
    public void Range_error_sign_follows_from_how_a_pseudorange_is_formed()
    {
        // Derived: P = c (t_receive - t_stamp). A clock running fast by y since the last upload stamps t_stamp = t_true + y T,
        // so P - rho = -c y T: measured minus modelled is negative.
        const double toleranceMeters = 1e-6;
        const double y = 2e-13, age = 7200, rho = 22_000_000;
        double tTransmit = 0.5; // small times keep the rounding of t (ulp ~ 1e-16 s) far below the tolerance
        double tReceive = tTransmit + rho / C;
        double stamp = tTransmit + y * age;
        double pseudorange = C * (tReceive - stamp);
        Assert.Equal(pseudorange - rho, ClockRateError.RangeErrorMeters(y, age), toleranceMeters);
        Assert.True(ClockRateError.RangeErrorMeters(y, age) < 0);
        Assert.Equal(-ClockRateError.RangeErrorMeters(y, age), ClockRateError.RangeErrorMeters(-y, age));
    }
}

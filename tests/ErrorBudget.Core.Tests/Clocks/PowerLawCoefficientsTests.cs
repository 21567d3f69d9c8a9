using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Tests.Clocks;

public class PowerLawCoefficientsTests
{
    private const double RelativeTolerance = 1e-12;

    [Fact]
    public void Each_term_follows_its_ieee_1139_relation()
    {
        // IEEE Std 1139 Table B.2 / NIST SP 1065 power-law table (REFERENCE-VALUES 2.1).
        const double tau = 30.0;
        const double fh = 0.5;
        double pi2 = Math.PI * Math.PI;
        AssertRel(3 * fh * 1e-20 / (4 * pi2 * tau * tau), new PowerLawCoefficients(1e-20, 0, 0, 0, 0, 0).AllanVariance(tau, fh));
        AssertRel((1.038 + 3 * Math.Log(2 * Math.PI * fh * tau)) * 1e-21 / (4 * pi2 * tau * tau), new PowerLawCoefficients(0, 1e-21, 0, 0, 0, 0).AllanVariance(tau, fh));
        AssertRel(2e-24 / (2 * tau), new PowerLawCoefficients(0, 0, 2e-24, 0, 0, 0).AllanVariance(tau, fh));
        AssertRel(2 * Math.Log(2) * 3e-29, new PowerLawCoefficients(0, 0, 0, 3e-29, 0, 0).AllanVariance(tau, fh));
        AssertRel(2 * pi2 / 3 * 1e-33 * tau, new PowerLawCoefficients(0, 0, 0, 0, 1e-33, 0).AllanVariance(tau, fh));
        AssertRel(1e-18 * 1e-18 * tau * tau / 2, new PowerLawCoefficients(0, 0, 0, 0, 0, -1e-18).AllanVariance(tau, fh));
    }

    [Fact]
    public void Allan_variance_is_the_sum_of_the_terms_and_deviation_its_root()
    {
        var c = new PowerLawCoefficients(1e-20, 1e-21, 2e-24, 3e-29, 1e-33, 1e-18);
        const double tau = 100.0;
        double sum = new PowerLawCoefficients(1e-20, 0, 0, 0, 0, 0).AllanVariance(tau, 0.5)
            + new PowerLawCoefficients(0, 1e-21, 0, 0, 0, 0).AllanVariance(tau, 0.5)
            + new PowerLawCoefficients(0, 0, 2e-24, 0, 0, 0).AllanVariance(tau, 0.5)
            + new PowerLawCoefficients(0, 0, 0, 3e-29, 0, 0).AllanVariance(tau, 0.5)
            + new PowerLawCoefficients(0, 0, 0, 0, 1e-33, 0).AllanVariance(tau, 0.5)
            + new PowerLawCoefficients(0, 0, 0, 0, 0, 1e-18).AllanVariance(tau, 0.5);
        AssertRel(sum, c.AllanVariance(tau, 0.5));
        AssertRel(Math.Sqrt(sum), c.AllanDeviation(tau, 0.5));
    }

    [Fact]
    public void Negative_or_non_finite_coefficients_are_reported_by_key()
    {
        var c = new PowerLawCoefficients(0, 0, -1e-24, double.NaN, 0, double.PositiveInfinity);
        var errors = c.Validate();
        Assert.Equal(3, errors.Count);
        Assert.StartsWith("h0:", errors[0], StringComparison.Ordinal);
        Assert.StartsWith("h-1:", errors[1], StringComparison.Ordinal);
        Assert.StartsWith("drift_per_s:", errors[2], StringComparison.Ordinal);
        var ex = Assert.Throws<ClockDefinitionException>(() => c.EnsureValid());
        Assert.Equal("h0", ex.Key);
        Assert.Contains("-1E-24", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Valid_coefficients_have_no_errors_and_negative_drift_is_allowed()
    {
        Assert.Empty(new PowerLawCoefficients(1e-20, 0, 2e-24, 3e-29, 1e-33, -1e-19).Validate());
    }

    [Fact]
    public void White_pm_without_a_bandwidth_is_an_error()
    {
        var c = new PowerLawCoefficients(1e-20, 0, 0, 0, 0, 0);
        Assert.Throws<ArgumentOutOfRangeException>(() => c.AllanVariance(1.0, 0.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => c.AllanVariance(0.0, 0.5));
    }

    private static void AssertRel(double expected, double actual) =>
        Assert.True(Math.Abs(actual - expected) <= RelativeTolerance * Math.Abs(expected), $"expected {expected:R}, got {actual:R}");
}

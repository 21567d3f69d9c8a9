using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Tests.Clocks;

public class TwoStateClockModelTests
{
    private const double RelativeTolerance = 1e-13;

    [Fact]
    public void Process_noise_matches_brown_and_hwang()
    {
        // Brown & Hwang 3rd ed. ch. 11; van Dierendonck, McGraw & Brown 1984 (REFERENCE-VALUES 2.2, check 12), h-1 = 0 form.
        const double h0 = 2e-24, hm2 = 1.5e-33, dt = 300.0;
        double pi2 = Math.PI * Math.PI;
        var q = TwoStateProcessNoise.For(h0, hm2, dt);
        AssertRel(h0 / 2 * dt + 2 * pi2 / 3 * hm2 * dt * dt * dt, q.Q11);
        AssertRel(pi2 * hm2 * dt * dt, q.Q12);
        AssertRel(2 * pi2 * hm2 * dt, q.Q22);
    }

    [Fact]
    public void Cholesky_factor_reproduces_q()
    {
        const double tol = 1e-12; // relative
        foreach (var (h0, hm2) in new[] { (2e-24, 1.5e-33), (0.0, 1e-33), (2e-24, 0.0) })
        {
            var q = TwoStateProcessNoise.For(h0, hm2, 60.0);
            Assert.Equal(q.Q11, q.L11 * q.L11, tol * q.Q11);
            Assert.Equal(q.Q12, q.L11 * q.L21, tol * Math.Max(q.Q12, 1e-300));
            Assert.Equal(q.Q22, q.L21 * q.L21 + q.L22 * q.L22, tol * Math.Max(q.Q22, 1e-300));
        }
    }

    [Fact]
    public void Step_applies_phi_and_drift_exactly_without_noise()
    {
        // Derived: x(t) = x0 + y0 t + D t^2 / 2, y(t) = y0 + D t; ten steps equal one step of 10 dt.
        const double tol = 1e-22;
        var model = new TwoStateClockModel(new PowerLawCoefficients(0, 0, 2e-24, 0, 1e-33, 1e-18), 10.0);
        double x = 1e-9, y = 2e-12;
        for (int i = 0; i < 10; i++)
        {
            model.Step(ref x, ref y, 0, 0);
        }

        Assert.Equal(1e-9 + 2e-12 * 100 + 0.5 * 1e-18 * 100 * 100, x, tol);
        Assert.Equal(2e-12 + 1e-18 * 100, y, 1e-26);
    }

    [Fact]
    public void Prediction_error_variance_is_q11_plus_the_flicker_term()
    {
        var c = new PowerLawCoefficients(0, 0, 2e-24, 3e-29, 1e-33, 0);
        const double age = 3600.0;
        AssertRel(TwoStateProcessNoise.For(c.H0, c.HMinus2, age).Q11 + 2 * Math.Log(2) * c.HMinus1 * age * age,
            TwoStateClockModel.PredictionErrorVariance(age, c));
        Assert.Equal(0.0, TwoStateClockModel.PredictionErrorVariance(0.0, c));
    }

    [Fact]
    public void Negative_coefficient_is_rejected_with_its_key()
    {
        var ex = Assert.Throws<ClockDefinitionException>(() => new TwoStateClockModel(new PowerLawCoefficients(0, 0, 2e-24, 0, -1e-33, 0), 1.0));
        Assert.Equal("h-2", ex.Key);
    }

    private static void AssertRel(double expected, double actual) =>
        Assert.True(Math.Abs(actual - expected) <= RelativeTolerance * Math.Abs(expected), $"expected {expected:R}, got {actual:R}");
}

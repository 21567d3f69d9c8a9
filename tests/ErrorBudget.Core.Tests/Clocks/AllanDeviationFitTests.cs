using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Tests.Clocks;

public class AllanDeviationFitTests
{
    private const double Fh = 0.5; // Hz, Nyquist of a 1 s step

    private static AllanDeviationPoint[] PointsOf(PowerLawCoefficients c, params double[] taus) =>
        Array.ConvertAll(taus, t => new AllanDeviationPoint(t, c.AllanDeviation(t, Fh)));

    [Fact]
    public void Exact_power_law_points_give_back_the_coefficients()
    {
        // Self-consistency (derived from the Table B.2 relations): noise-free points are fitted exactly.
        const double relTol = 1e-6;
        var truth = new PowerLawCoefficients(1e-22, 0, 2e-24, 3.5e-29, 1e-35, 0);
        var fit = AllanDeviationFit.Fit(PointsOf(truth, 1, 3, 10, 30, 100, 300, 1e3, 3e3, 1e4, 3e4, 1e5, 1e6), Fh);
        Assert.True(fit.RelativeRmsResidual < 1e-8, $"rms {fit.RelativeRmsResidual}");
        Assert.Equal(truth.H2, fit.Coefficients.H2, truth.H2 * relTol);
        Assert.Equal(truth.H0, fit.Coefficients.H0, truth.H0 * relTol);
        Assert.Equal(truth.HMinus1, fit.Coefficients.HMinus1, truth.HMinus1 * relTol);
        Assert.Equal(truth.HMinus2, fit.Coefficients.HMinus2, truth.HMinus2 * relTol);
    }

    [Fact]
    public void Drift_is_recovered_when_asked()
    {
        const double relTol = 1e-6;
        var truth = new PowerLawCoefficients(0, 0, 2e-24, 3.5e-29, 0, 2e-19);
        var fit = AllanDeviationFit.Fit(PointsOf(truth, 1, 10, 100, 1e3, 1e4, 1e5, 1e6), Fh, fitDrift: true);
        Assert.Equal(truth.DriftPerSecond, fit.Coefficients.DriftPerSecond, truth.DriftPerSecond * relTol);
        Assert.Equal(truth.H0, fit.Coefficients.H0, truth.H0 * relTol);
    }

    [Fact]
    public void A_white_fm_spec_with_a_floor_fits_with_zero_for_absent_terms()
    {
        // Mattioni 2002 PHM spec sigma = 1e-12 tau^-1/2 plus a 7e-15 floor (Berthoud 2003); h2 and h-2 must come out ~0.
        var truth = ClockCatalogue.Lookup("passive-hydrogen-maser").Coefficients;
        var fit = AllanDeviationFit.Fit(PointsOf(truth, 1, 10, 100, 1e3, 1e4, 1e5), Fh);
        Assert.True(fit.RelativeRmsResidual < 1e-6);
        Assert.True(fit.Coefficients.HMinus2 >= 0 && fit.Coefficients.HMinus2 < 1e-40);
        Assert.True(fit.Coefficients.H2 >= 0 && fit.Coefficients.H2 < 1e-32);
    }

    [Fact]
    public void Noisy_points_fit_within_the_threshold_and_report_the_residual()
    {
        // +-10 % alternating errors on exact points: rms relative residual must be about 10 % or less.
        var truth = new PowerLawCoefficients(0, 0, 2e-24, 3.5e-29, 1e-35, 0);
        var points = PointsOf(truth, 1, 10, 100, 1e3, 1e4, 1e5);
        for (int i = 0; i < points.Length; i++)
        {
            points[i] = points[i] with { Sigma = points[i].Sigma * (i % 2 == 0 ? 1.1 : 0.9) };
        }

        var fit = AllanDeviationFit.Fit(points, Fh);
        Assert.InRange(fit.RelativeRmsResidual, 0.0, 0.11);
        Assert.Equal(points.Length, fit.RelativeResiduals.Count);
    }

    [Fact]
    public void A_slope_no_power_law_can_make_fails_naming_the_points()
    {
        // sigma ~ tau^+2 cannot be made of non-negative tau^-1, tau^-1/2, tau^0, tau^+1/2 terms.
        var points = new[]
        {
            new AllanDeviationPoint(1, 1e-14), new AllanDeviationPoint(10, 1e-12),
            new AllanDeviationPoint(100, 1e-10), new AllanDeviationPoint(1000, 1e-8), new AllanDeviationPoint(1e4, 1e-6),
        };
        var ex = Assert.Throws<ClockDefinitionException>(() => AllanDeviationFit.Fit(points, Fh));
        Assert.Equal("adev", ex.Key);
        Assert.Contains("rms relative error", ex.Message, StringComparison.Ordinal);
        Assert.Contains("[4] 1E+04: 1E-06", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fewer_points_than_terms_is_an_error()
    {
        var points = new[] { new AllanDeviationPoint(1, 1e-12), new AllanDeviationPoint(10, 3e-13), new AllanDeviationPoint(100, 1e-13) };
        var ex = Assert.Throws<ClockDefinitionException>(() => AllanDeviationFit.Fit(points, Fh));
        Assert.Equal("adev", ex.Key);
        Assert.Contains("3 Allan deviation point(s) cannot determine 4 free terms", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(-1.0, 1e-12)]
    [InlineData(10.0, 0.0)]
    [InlineData(double.NaN, 1e-12)]
    public void Non_positive_tau_or_sigma_is_an_error_naming_the_point(double tau, double sigma)
    {
        var points = new[]
        {
            new AllanDeviationPoint(1, 1e-12), new AllanDeviationPoint(tau, sigma),
            new AllanDeviationPoint(100, 1e-13), new AllanDeviationPoint(1000, 5e-14),
        };
        var ex = Assert.Throws<ClockDefinitionException>(() => AllanDeviationFit.Fit(points, Fh));
        Assert.Equal("adev", ex.Key);
        Assert.Contains("point 1", ex.Message, StringComparison.Ordinal);
    }
}

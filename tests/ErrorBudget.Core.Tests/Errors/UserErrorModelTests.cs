using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Errors;

/// <summary>User-level variances reproduced by hand from the component formulas (derived from DO-229 appendix J models).</summary>
public class UserErrorModelTests
{
    private const double Deg = Math.PI / 180.0;
    private const double VarianceTolerance = 1e-9;

    [Fact]
    public void Single_frequency_variance_adds_iono_tropo_multipath_and_noise()
    {
        var spec = new UserEnvironmentSpec(IonosphereMode.SingleFrequency, 2.0, FrequencyPair.L1L2, 0.12, MultipathModel.Airborne, 0.36);
        var model = UserErrorModel.From(spec);
        const double el = 30 * Deg;

        // By hand: obliquity 1/√(1 − (6378.1363 cos30°/6728.1363)²), mapping 1.001/√(0.002001 + 0.25),
        // multipath 0.13 + 0.53 e^(−3), noise 0.36 m.
        double x = 6378.1363 * Math.Cos(el) / 6728.1363;
        double iono = 2.0 / Math.Sqrt(1 - (x * x));
        double tropo = 0.12 * 1.001 / Math.Sqrt(0.002001 + 0.25);
        double mp = 0.13 + (0.53 * Math.Exp(-3));
        double expected = (iono * iono) + (tropo * tropo) + (mp * mp) + (0.36 * 0.36);
        Assert.Equal(expected, model.RangeVariance(el), VarianceTolerance);
        Assert.Equal(12.48121732, model.RangeVariance(el), 1e-7);   // the same sum evaluated once, m²

        model.Components(el, out double i, out double t, out double m, out double n);
        Assert.Equal(iono, i, 1e-12);
        Assert.Equal(tropo, t, 1e-12);
        Assert.Equal(mp, m, 1e-12);
        Assert.Equal(0.36, n, 1e-12);
    }

    [Fact]
    public void Dual_frequency_variance_drops_the_iono_term_and_amplifies_multipath_and_noise()
    {
        var spec = new UserEnvironmentSpec(IonosphereMode.DualFrequency, 2.0, FrequencyPair.L1L5, 0.12, MultipathModel.Ground, 0.3);
        var model = UserErrorModel.From(spec);
        const double el = 15 * Deg;

        // By hand: k = √(f1⁴ + f5⁴)/(f1² − f5²) (REFERENCE-VALUES §8), ground curve 0.5 + 1.65 e^(−15/14.3).
        const double f1 = 1575.42, f5 = 1176.45;
        double k = Math.Sqrt((f1 * f1 * f1 * f1) + (f5 * f5 * f5 * f5)) / ((f1 * f1) - (f5 * f5));
        double s = Math.Sin(el);
        double tropo = 0.12 * 1.001 / Math.Sqrt(0.002001 + (s * s));
        double mp = 0.5 + (1.65 * Math.Exp(-15 / 14.3));
        double expected = (tropo * tropo) + (k * k * ((mp * mp) + (0.3 * 0.3)));
        Assert.Equal(expected, model.RangeVariance(el), VarianceTolerance);
        Assert.Equal(8.59747655, model.RangeVariance(el), 1e-7);

        model.Components(el, out double i, out double t, out double m, out double n);
        Assert.Equal(0.0, i);
        Assert.Equal(tropo, t, 1e-12);
        Assert.Equal(k * mp, m, 1e-12);
        Assert.Equal(k * 0.3, n, 1e-12);
    }

    [Fact]
    public void Components_square_sum_is_the_range_variance_at_every_elevation()
    {
        var model = UserErrorModel.From(
            new UserEnvironmentSpec(IonosphereMode.SingleFrequency, 1.5, FrequencyPair.L1L5, 0.2, MultipathModel.Ground, 0.5));
        for (double deg = 0; deg <= 90; deg += 2.5)
        {
            model.Components(deg * Deg, out double i, out double t, out double m, out double n);
            double v = model.RangeVariance(deg * Deg);
            Assert.Equal((i * i) + (t * t) + (m * m) + (n * n), v, 1e-12 * v);
        }
    }

    [Fact]
    public void Negative_sigma_is_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => UserErrorModel.From(
            new UserEnvironmentSpec(IonosphereMode.SingleFrequency, -1, FrequencyPair.L1L2, 0.12, MultipathModel.None, 0.3)));
        Assert.Throws<ArgumentOutOfRangeException>(() => UserErrorModel.From(
            new UserEnvironmentSpec(IonosphereMode.SingleFrequency, 1, FrequencyPair.L1L2, 0.12, (MultipathModel)9, 0.3)));
    }
}

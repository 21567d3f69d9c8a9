using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Scenarios;

/// <summary>[clock] grades (issue 3): catalogue, overrides, custom fits, and every bad definition named by its key.</summary>
public class ClockGradeScenarioTests
{
    private const double ExactTolerance = 0.0;

    private static string WithClock(string clockBody) => ScenarioText.Valid + "[clock]\n" + clockBody + "\n";

    private static int LineOf(string text, string startsWith) =>
        Array.FindIndex(text.Split('\n'), l => l.StartsWith(startsWith, StringComparison.Ordinal)) + 1;

    [Fact]
    public void Without_a_grade_the_clock_is_the_simple_model_with_its_defaults()
    {
        var clock = ScenarioLoader.Load(ScenarioText.Valid, ScenarioText.Source).Clock;

        Assert.False(clock.IsGraded);
        Assert.Null(clock.Grade);
        Assert.Null(clock.Noise);
        Assert.Equal(0.0, clock.UploadJitterSeconds, ExactTolerance);
        Assert.Equal(new ClockSpec(0.5, 0.2 / 3600, 43_200), clock);
    }

    [Fact]
    public void A_catalogue_grade_takes_the_catalogue_coefficients_and_the_estimation_defaults()
    {
        var clock = ScenarioLoader.Load(WithClock("grade = \"rubidium\""), ScenarioText.Source).Clock;

        Assert.True(clock.IsGraded);
        Assert.Equal("rubidium", clock.Grade);
        Assert.Equal(ClockCatalogue.Lookup("rubidium").Coefficients, clock.Noise);
        Assert.Equal(1e-9, clock.EstimationPhaseSigmaSeconds, ExactTolerance); // 1 ns default
        Assert.Equal(1e-14, clock.EstimationFrequencySigma, ExactTolerance);
        Assert.Null(clock.AdevPoints);
    }

    [Fact]
    public void Coefficient_overrides_replace_the_catalogue_values_and_drift_is_converted_to_per_second()
    {
        var text = WithClock("""
            grade = "cesium-beam"
            h0 = 3e-22
            h_minus_2 = 1e-35
            drift_per_day = -8.64e-14
            estimation_phase_sigma_ns = 2.5
            estimation_frequency_sigma = 3e-15
            """);

        var clock = ScenarioLoader.Load(text, ScenarioText.Source).Clock;

        var catalogue = ClockCatalogue.Lookup("cesium-beam").Coefficients;
        var noise = clock.Noise!.Value;
        Assert.Equal(3e-22, noise.H0, ExactTolerance);
        Assert.Equal(1e-35, noise.HMinus2, ExactTolerance);
        Assert.Equal(catalogue.HMinus1, noise.HMinus1, ExactTolerance);
        Assert.Equal(catalogue.H2, noise.H2, ExactTolerance);
        Assert.Equal(-1e-18, noise.DriftPerSecond, 1e-33); // derived: -8.64e-14 / 86400 s; tolerance a few ulps
        Assert.Equal(2.5e-9, clock.EstimationPhaseSigmaSeconds, 1e-24);
        Assert.Equal(3e-15, clock.EstimationFrequencySigma, ExactTolerance);
    }

    [Fact]
    public void A_custom_grade_is_fitted_to_its_allan_deviation_points_and_keeps_the_residual()
    {
        // Points of a pure white FM + flicker floor clock: sigma^2 = h0/(2 tau) + 2 ln2 h-1 with h0 = 2e-24, h-1 = 1e-28
        // (IEEE Std 1139 Table B.2): an exact fit exists, so the residual is at rounding level.
        double[] tau = [1, 10, 100, 1000, 10_000];
        double Sigma(double t) => Math.Sqrt(2e-24 / (2 * t) + 2 * Math.Log(2) * 1e-28);
        string list = string.Join(", ", tau.Select(t => Sigma(t).ToString("R", System.Globalization.CultureInfo.InvariantCulture)));
        var text = WithClock($"grade = \"custom\"\nadev_tau_s = [1, 10, 100, 1000, 10000]\nadev_sigma = [{list}]");

        var clock = ScenarioLoader.Load(text, ScenarioText.Source).Clock;

        Assert.Equal("custom", clock.Grade);
        Assert.Equal(5, clock.AdevPoints!.Count);
        Assert.InRange(clock.AdevFitRelativeRms!.Value, 0, 1e-6); // exact model: residual only from the solver's rounding
        var noise = clock.Noise!.Value;
        Assert.Equal(2e-24, noise.H0, 2e-30);   // relative 1e-6, as the residual bound
        Assert.Equal(1e-28, noise.HMinus1, 1e-34);
    }

    [Fact]
    public void A_custom_grade_may_be_given_by_coefficients_alone()
    {
        var clock = ScenarioLoader.Load(WithClock("grade = \"custom\"\nh0 = 4e-24"), ScenarioText.Source).Clock;

        Assert.Equal(new PowerLawCoefficients(0, 0, 4e-24, 0, 0, 0), clock.Noise);
    }

    [Fact]
    public void An_unknown_grade_is_an_error_naming_the_key_and_listing_the_grades()
    {
        var text = WithClock("grade = \"atomic-wristwatch\"");

        var error = ScenarioText.SingleError(text, "clock.grade", LineOf(text, "grade ="));

        foreach (var name in ClockCatalogue.Names.Append("custom"))
        {
            Assert.Contains($"\"{name}\"", error.Message, StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData("h2")]
    [InlineData("h0")]
    [InlineData("h_minus_1")]
    [InlineData("h_minus_2")]
    public void A_negative_coefficient_is_an_error_naming_the_key(string key)
    {
        var text = WithClock($"grade = \"rubidium\"\n{key} = -1e-24");

        var error = ScenarioText.SingleError(text, $"clock.{key}", LineOf(text, key + " ="));

        Assert.Contains("must be >= 0", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_custom_grade_with_only_a_negative_coefficient_gets_the_one_range_error()
    {
        var text = WithClock("grade = \"custom\"\nh_minus_1 = -3e-28");

        ScenarioText.SingleError(text, "clock.h_minus_1", LineOf(text, "h_minus_1 ="));
    }

    [Fact]
    public void Allan_deviation_points_that_cannot_be_fitted_are_an_error_naming_the_key()
    {
        // sigma_y falling as tau^-2 (steeper than white PM's tau^-1): no non-negative power-law sum follows it.
        var text = WithClock("grade = \"custom\"\nadev_tau_s = [1, 10, 100, 1000]\nadev_sigma = [1e-10, 1e-12, 1e-14, 1e-16]");

        var error = ScenarioText.SingleError(text, "clock.adev_sigma", LineOf(text, "adev_sigma ="));

        Assert.Contains("cannot be fitted", error.Message, StringComparison.Ordinal);
        Assert.Contains("rms relative error", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("grade = \"custom\"\nadev_tau_s = [1, 10, 100, 1000]\nadev_sigma = [1e-12, 1e-13, 1e-14]", "clock.adev_sigma", "adev_sigma =", "has 3 items")]
    [InlineData("grade = \"custom\"\nadev_tau_s = [1, 100, 10, 1000]\nadev_sigma = [1e-12, 1e-13, 1e-14, 1e-15]", "clock.adev_tau_s", "adev_tau_s =", "not strictly increasing")]
    [InlineData("grade = \"custom\"\nadev_tau_s = [1, 10, 100, 1000]", "clock.adev_tau_s", "adev_tau_s =", "without clock.adev_sigma")]
    [InlineData("grade = \"rubidium\"\nadev_tau_s = [1, 10, 100, 1000]\nadev_sigma = [1e-12, 1e-13, 1e-14, 1e-15]", "clock.adev_tau_s", "adev_tau_s =", "defines a custom clock")]
    [InlineData("grade = \"custom\"\nadev_tau_s = [1, 10, 100, 1000]\nadev_sigma = [1e-12, 1e-13, -1e-14, 1e-15]", "clock.adev_sigma", "adev_sigma =", "item 3")]
    [InlineData("grade = \"custom\"\nadev_tau_s = 10\nadev_sigma = [1e-12]", "clock.adev_tau_s", "adev_tau_s =", "not an array of numbers")]
    [InlineData("grade = \"custom\"\nadev_tau_s = [1, \"ten\"]\nadev_sigma = [1e-12, 1e-13]", "clock.adev_tau_s", "adev_tau_s =", "item 2 is not a finite number")]
    [InlineData("grade = \"custom\"", "clock.grade", "grade =", "defines no clock")]
    [InlineData("h0 = 1e-24", "clock.h0", "h0 =", "needs clock.grade")]
    [InlineData("estimation_phase_sigma_ns = 2", "clock.estimation_phase_sigma_ns", "estimation_phase_sigma_ns =", "needs clock.grade")]
    [InlineData("grade = \"rubidium\"\ngrowth_sigma_m_per_h = 0.1", "clock.growth_sigma_m_per_h", "growth_sigma_m_per_h =", "applies only to the simple clock model")]
    [InlineData("upload_interval_h = 1\nupload_jitter_s = 361", "clock.upload_jitter_s", "upload_jitter_s =", "more than a tenth")]
    [InlineData("drift_per_day = 1e-3\ngrade = \"rubidium\"", "clock.drift_per_day", "drift_per_day =", "out of range")]
    public void A_bad_clock_definition_is_one_error_naming_its_key(string body, string key, string line, string problem)
    {
        var text = WithClock(body);

        var error = ScenarioText.SingleError(text, key, LineOf(text, line));

        Assert.Contains(problem, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_jitter_limit_follows_the_shortest_shell_interval()
    {
        var text = ScenarioText.With("semi_major_axis_km = 27600", "semi_major_axis_km = 27600\nupload_interval_h = 0.5")
            + "[clock]\nupload_jitter_s = 200\n";

        var error = ScenarioText.SingleError(text, "clock.upload_jitter_s", LineOf(text, "upload_jitter_s ="));

        Assert.Contains("shell[1].upload_interval_h = 0.5", error.Message, StringComparison.Ordinal);
        Assert.Contains("upload_jitter_s <= 180", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_shell_may_set_its_own_upload_interval_and_jitter_has_a_shape()
    {
        var text = ScenarioText.With("semi_major_axis_km = 27600", "semi_major_axis_km = 27600\nupload_interval_h = 2")
            + "[clock]\nupload_jitter_s = 60\nupload_jitter_distribution = \"gaussian\"\n";

        var scenario = ScenarioLoader.Load(text, ScenarioText.Source);

        Assert.Equal(7200.0, scenario.Shells[0].UploadIntervalSeconds!.Value, ExactTolerance);
        Assert.Equal(43_200.0, scenario.Clock.UploadIntervalSeconds, ExactTolerance);
        Assert.Equal(60.0, scenario.Clock.UploadJitterSeconds, ExactTolerance);
        Assert.Equal(UploadJitterDistribution.Gaussian, scenario.Clock.JitterDistribution);
    }

    [Fact]
    public void A_shell_without_its_own_interval_uses_the_clock_interval()
    {
        var scenario = ScenarioLoader.Load(ScenarioText.Valid, ScenarioText.Source);

        Assert.Null(scenario.Shells[0].UploadIntervalSeconds);
    }
}

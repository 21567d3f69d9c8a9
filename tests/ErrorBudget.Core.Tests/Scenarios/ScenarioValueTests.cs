namespace ErrorBudget.Core.Tests.Scenarios;

public class ScenarioValueTests
{
    [Fact]
    public void A_mask_of_ninety_degrees_is_out_of_range()
    {
        var text = ScenarioText.With("mask_deg = 10", "mask_deg = 90");

        var error = ScenarioText.SingleError(text, "grid.mask_deg", line: 16);

        Assert.Equal("test.toml:16: grid.mask_deg = 90 is out of range (must be < 90); allowed: 0 <= mask_deg < 90", error.Message);
        Assert.Equal("90", error.Value);
        Assert.Equal("0 <= mask_deg < 90", error.Allowed);
    }

    [Fact]
    public void A_negative_sigma_must_be_at_least_zero()
    {
        var text = ScenarioText.Valid + "[clock]\nupload_sigma_m = -0.5\n";

        var error = ScenarioText.SingleError(text, "clock.upload_sigma_m", ScenarioText.LineOf(text, "upload_sigma_m = -0.5"));

        Assert.Contains("clock.upload_sigma_m = -0.5 is out of range (must be >= 0)", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("[orbit]", "along_sigma_m")]
    [InlineData("[user]", "noise_sigma_m")]
    [InlineData("[user]", "iono_vertical_sigma_m")]
    [InlineData("[assumed]", "tropo_zenith_sigma_m")]
    public void Every_negative_sigma_says_it_must_be_at_least_zero(string table, string key)
    {
        var text = ScenarioText.Valid + $"{table}\n{key} = -1\n";

        var error = ScenarioText.SingleError(text, $"{table.Trim('[', ']')}.{key}", ScenarioText.LineOf(text, $"{key} = -1"));

        Assert.Contains("must be >= 0", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_step_of_zero_seconds_is_out_of_range()
    {
        var text = ScenarioText.With("step_s = 600", "step_s = 0");

        var error = ScenarioText.SingleError(text, "run.step_s", line: 4);

        Assert.Contains("is out of range (must be >= 1)", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Zero_trials_are_out_of_range()
    {
        var text = ScenarioText.With("trials = 10", "trials = 0");

        var error = ScenarioText.SingleError(text, "run.trials", line: 2);

        Assert.Equal("test.toml:2: run.trials = 0 is out of range (must be >= 1); allowed: integer 1 <= trials <= 1000000", error.Message);
    }

    [Fact]
    public void A_string_where_a_number_is_needed_is_a_type_error()
    {
        var text = ScenarioText.With("duration_h = 2", "duration_h = \"2\"");

        var error = ScenarioText.SingleError(text, "run.duration_h", line: 3);

        Assert.Equal("test.toml:3: run.duration_h = \"2\" is not a number; allowed: 0 < duration_h <= 720", error.Message);
    }

    [Fact]
    public void A_float_where_an_integer_is_needed_is_a_type_error()
    {
        var text = ScenarioText.With("satellites = 12", "satellites = 12.0");

        var error = ScenarioText.SingleError(text, "shell[1].satellites", line: 7);

        Assert.Contains("shell[1].satellites = 12.0 is not an integer", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_infinite_number_is_rejected()
    {
        var text = ScenarioText.With("inclination_deg = 55", "inclination_deg = inf");

        var error = ScenarioText.SingleError(text, "shell[1].inclination_deg", line: 10);

        Assert.Contains("is not a finite number", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_bad_choice_lists_the_allowed_values()
    {
        var text = ScenarioText.Valid + "[user]\nmultipath = \"indoor\"\n";

        var error = ScenarioText.SingleError(text, "user.multipath", ScenarioText.LineOf(text, "multipath = \"indoor\""));

        Assert.Equal("\"airborne\", \"ground\", \"none\"", error.Allowed);
        Assert.EndsWith("user.multipath = \"indoor\" is not one of the allowed values; allowed: \"airborne\", \"ground\", \"none\"", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_choice_given_as_a_number_is_a_type_error()
    {
        var text = ScenarioText.Valid + "[user]\nionosphere = 2\n";

        var error = ScenarioText.SingleError(text, "user.ionosphere", ScenarioText.LineOf(text, "ionosphere = 2"));

        Assert.Contains("is not a string; allowed: \"single-frequency\", \"dual-frequency\"", error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("start_utc = \"2031-06-01\"")]
    [InlineData("start_utc = \"2031-06-01T00:00:00\"")]
    [InlineData("start_utc = \"June 1, 2031\"")]
    [InlineData("start_utc = 2031-06-01T00:00:00")]
    public void A_start_without_a_full_rfc3339_instant_is_rejected(string line)
    {
        var text = ScenarioText.With("trials = 10", "trials = 10\n" + line);

        var error = ScenarioText.SingleError(text, "run.start_utc", line: 3);

        Assert.Contains("is not an RFC 3339 timestamp", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_eccentricity_above_the_limit_is_out_of_range()
    {
        var text = ScenarioText.With("semi_major_axis_km = 27600", "semi_major_axis_km = 27600\neccentricity = 0.95");

        var error = ScenarioText.SingleError(text, "shell[1].eccentricity", line: 12);

        Assert.Contains("(must be <= 0.9)", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_upload_interval_below_one_minute_is_out_of_range()
    {
        var text = ScenarioText.Valid + "[clock]\nupload_interval_h = 0.01\n";

        var error = ScenarioText.SingleError(text, "clock.upload_interval_h", ScenarioText.LineOf(text, "upload_interval_h = 0.01"));

        Assert.Equal("1/60 (one minute) <= upload_interval_h <= 720", error.Allowed);
    }
}

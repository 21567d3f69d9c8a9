using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Scenarios;

public class ScenarioSyntaxTests
{
    [Fact]
    public void A_value_missing_after_the_equals_sign_is_reported_at_its_line_with_its_key()
    {
        var text = ScenarioText.With("step_s = 600", "step_s = ");

        var error = ScenarioText.SingleError(text, "run.step_s", line: 4);

        Assert.Contains("invalid TOML at run.step_s", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unterminated_string_is_reported_at_its_line()
    {
        var text = ScenarioText.Valid + "[user]\nmultipath = \"airborne\n";
        var line = ScenarioText.LineOf(text, "multipath = \"airborne");

        var errors = ScenarioText.Errors(text);

        Assert.All(errors, e => Assert.Equal(line, e.Line));
        Assert.All(errors, e => Assert.Contains("invalid TOML", e.Message, StringComparison.Ordinal));
    }

    [Fact]
    public void A_syntax_error_is_reported_alone_because_the_structure_past_it_is_unknown()
    {
        // mask_deg = 95 would be a range error, but the broken header comes first.
        var text = ScenarioText.With("mask_deg = 10", "mask_deg = 95") + "[user\n";

        var error = Assert.Single(ScenarioText.Errors(text));

        Assert.Equal(ScenarioText.LineOf(text, "[user"), error.Line);
        Assert.Equal("valid TOML", error.Allowed);
    }

    [Fact]
    public void An_array_left_open_at_the_end_of_the_file_is_reported_at_the_last_line()
    {
        // Tomlyn places this diagnostic at the first character of the file; the loader moves it to the end.
        var text = ScenarioText.Valid + "[user]\nnoise_sigma_m = [0.3,\n";
        var lastLine = text.Split('\n').Length;

        var errors = ScenarioText.Errors(text);

        Assert.All(errors, e => Assert.Equal(lastLine, e.Line));
    }

    [Fact]
    public void A_plain_table_conflicting_with_an_array_of_tables_is_worded_once_by_the_loader()
    {
        // Tomlyn's validator flags this line too ("already defined"); only the loader's message is kept.
        var text = ScenarioText.Valid + "[shell]\nsatellites = 3\nplanes = 3\ninclination_deg = 55\nsemi_major_axis_km = 27600\n";

        var error = ScenarioText.SingleError(text, "shell", ScenarioText.LineOf(text, "[shell]"));

        Assert.Contains("[shell] has the wrong brackets", error.Message, StringComparison.Ordinal);
    }
}

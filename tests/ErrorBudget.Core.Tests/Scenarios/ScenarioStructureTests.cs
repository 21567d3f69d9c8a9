using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Scenarios;

public class ScenarioStructureTests
{
    [Fact]
    public void An_unknown_key_is_named_with_its_line_and_the_keys_of_its_table()
    {
        var text = ScenarioText.With("mask_deg = 10", "mask = 10");

        var error = ScenarioText.SingleError(text, "grid.mask", line: 16);

        Assert.Equal("test.toml:16: grid.mask = 10 is not a known key of [grid]; allowed: " + error.Allowed, error.Message);
        Assert.Contains("mask_deg", error.Allowed, StringComparison.Ordinal);
        Assert.Contains("lat_step_deg", error.Allowed, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_table_is_named_with_its_line_and_the_allowed_tables()
    {
        var text = ScenarioText.Valid + "[failures]\nrate_per_h = 1\n";

        var error = ScenarioText.SingleError(text, "failures", ScenarioText.LineOf(text, "[failures]"));

        Assert.Equal("[run], [[shell]], [grid], [clock], [orbit], [user], [assumed], [relativity], [integrity], [faults]", error.Allowed);
    }

    [Fact]
    public void A_key_before_the_first_table_is_rejected()
    {
        var text = "seed = 3\n" + ScenarioText.Valid;

        var error = ScenarioText.SingleError(text, "seed", line: 1);

        Assert.Contains("is outside any table", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_duplicate_key_is_reported_once_at_its_second_line()
    {
        var text = ScenarioText.With("duration_h = 2", "duration_h = 2\ntrials = 11");

        // Tomlyn's own duplicate diagnostic on the same line must not be reported a second time.
        var error = ScenarioText.SingleError(text, "run.trials", line: 4);

        Assert.Equal("11", error.Value);
        Assert.Contains("is defined twice (first at line 2)", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_table_written_twice_is_reported_at_its_second_header()
    {
        var text = ScenarioText.Valid + "[grid]\nheight_m = 10\n";

        var error = ScenarioText.SingleError(text, "grid", ScenarioText.LineOf(text, "height_m = 10") - 1);

        Assert.Contains("[grid] is defined twice (first at line 13)", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_required_key_is_reported_at_its_table_line()
    {
        var text = ScenarioText.With("trials = 10", "");

        var error = ScenarioText.SingleError(text, "run.trials", line: 1);

        Assert.Equal("test.toml:1: run.trials is missing; allowed: integer 1 <= trials <= 1000000", error.Message);
    }

    [Fact]
    public void A_missing_grid_table_is_an_error_with_line_zero()
    {
        var text = ScenarioText.Valid[..ScenarioText.Valid.IndexOf("[grid]", StringComparison.Ordinal)];

        var error = ScenarioText.SingleError(text, "grid", line: 0);

        Assert.StartsWith("test.toml: [grid] is missing; allowed: a [grid] table with keys lat_step_deg", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_scenario_without_shells_is_an_error()
    {
        var valid = ScenarioText.Valid;
        var start = valid.IndexOf("[[shell]]", StringComparison.Ordinal);
        var text = valid[..start] + valid[valid.IndexOf("[grid]", StringComparison.Ordinal)..];

        ScenarioText.SingleError(text, "shell", line: 0);
    }

    [Fact]
    public void A_missing_run_table_is_an_error()
    {
        var text = ScenarioText.Valid[ScenarioText.Valid.IndexOf("[[shell]]", StringComparison.Ordinal)..];

        ScenarioText.SingleError(text, "run", line: 0);
    }

    [Fact]
    public void A_shell_written_as_a_plain_table_is_rejected()
    {
        var text = ScenarioText.With("[[shell]]", "[shell]");

        var error = ScenarioText.SingleError(text, "shell", line: 6);

        Assert.Equal("[[shell]]", error.Allowed);
    }

    [Fact]
    public void More_than_twenty_shells_are_rejected_at_the_twenty_first()
    {
        const string shell = "[[shell]]\nsatellites = 3\nplanes = 3\ninclination_deg = 55\nsemi_major_axis_km = 27600\n";
        var text = ScenarioText.Valid + string.Concat(Enumerable.Repeat(shell, 20));
        // The base file has one shell, so the 20th appended header is the 21st shell.
        var lines = text.Split('\n');
        var line = Enumerable.Range(0, lines.Length).Where(i => lines[i] == "[[shell]]").ElementAt(20) + 1;

        var error = ScenarioText.SingleError(text, "shell[21]", line);

        Assert.Contains("more than the 20 shells allowed", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Two_shells_with_the_same_name_are_rejected_at_the_second_name()
    {
        const string shell = "[[shell]]\nname = \"meo\"\nsatellites = 3\nplanes = 3\ninclination_deg = 55\nsemi_major_axis_km = 27600\n";
        var text = ScenarioText.Valid + shell + shell;
        var line = ScenarioText.LineOf(text, "name = \"meo\"") + 6;

        var error = ScenarioText.SingleError(text, "shell[3].name", line);

        Assert.Contains("repeats the name of shell[2]", error.Message, StringComparison.Ordinal);
    }
}

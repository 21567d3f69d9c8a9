using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Scenarios;

/// <summary>The [relativity] table (issue 4): defaults, every key read, and every bad value named with its key and line.</summary>
public class RelativityScenarioTests
{
    private const double ExactTolerance = 0.0;

    [Fact]
    public void Without_a_relativity_table_every_term_is_applied_in_full()
    {
        var scenario = ScenarioLoader.Load(ScenarioText.Valid, ScenarioText.Source);

        Assert.Equal(RelativitySpec.AllApplied, scenario.Relativity);
        Assert.Equal(FrequencyOffsetMode.Applied, scenario.Relativity.FrequencyOffset);
        Assert.Equal(1.0, scenario.Relativity.FrequencyOffsetFactor, ExactTolerance);
        Assert.Equal(1.0, scenario.Relativity.EccentricityFactor, ExactTolerance);
        Assert.Equal(GroundAbsorption.Offset, scenario.Relativity.GroundAbsorbs);
        Assert.True(double.IsNaN(scenario.Shells[0].RelativityPresetSemiMajorAxisMeters));
    }

    [Fact]
    public void Every_key_is_read_in_si_units()
    {
        var text = ScenarioText.Valid + """
            [relativity]
            frequency_offset = "preset"
            preset_semi_major_axis_km = 26561.75
            frequency_offset_factor = 0.5
            eccentricity_term = "missed"
            sagnac = "missed"
            shapiro = "missed"
            ground_absorbs = "none"
            """;

        var r = ScenarioLoader.Load(text, ScenarioText.Source).Relativity;

        Assert.Equal(
            new RelativitySpec(FrequencyOffsetMode.Preset, 26_561_750.0, 0.5, RelativityTermMode.Missed, 1.0,
                RelativityTermMode.Missed, RelativityTermMode.Missed, GroundAbsorption.None),
            r);
    }

    [Fact]
    public void A_shell_preset_overrides_the_table_preset()
    {
        var text = ScenarioText.With("semi_major_axis_km = 27600", "semi_major_axis_km = 27600\nrelativity_preset_semi_major_axis_km = 29600")
            + "[relativity]\nfrequency_offset = \"preset\"\n";

        var scenario = ScenarioLoader.Load(text, ScenarioText.Source);

        Assert.Equal(29_600_000.0, scenario.Shells[0].RelativityPresetSemiMajorAxisMeters, ExactTolerance);
        Assert.Equal(29_600_000.0, scenario.Relativity.PresetFor(scenario.Shells[0]), ExactTolerance);
        Assert.True(double.IsNaN(scenario.Relativity.PresetSemiMajorAxisMeters));
    }

    public static TheoryData<string, string, string, string> BadTables => new()
    {
        { "frequency_offset = \"sometimes\"", "frequency_offset = \"sometimes\"", "relativity.frequency_offset", "is not one of the allowed values" },
        { "frequency_offset_factor = 2.5", "frequency_offset_factor = 2.5", "relativity.frequency_offset_factor", "must be <= 2" },
        { "eccentricity_factor = -0.1", "eccentricity_factor = -0.1", "relativity.eccentricity_factor", "must be >= 0" },
        { "sagnac = true", "sagnac = true", "relativity.sagnac", "is not a string" },
        { "shapiro = \"partly\"", "shapiro = \"partly\"", "relativity.shapiro", "is not one of the allowed values" },
        { "ground_absorbs = \"all\"", "ground_absorbs = \"all\"", "relativity.ground_absorbs", "is not one of the allowed values" },
        { "colour = 1", "colour = 1", "relativity.colour", "is not a known key of [relativity]" },
        { "frequency_offset = \"preset\"\npreset_semi_major_axis_km = 6000", "preset_semi_major_axis_km = 6000", "relativity.preset_semi_major_axis_km", "must be > 6378.137" },
        { "frequency_offset = \"preset\"", "frequency_offset = \"preset\"", "relativity.frequency_offset", "needs the orbit the offset was set for, and shell[1] has none" },
        { "preset_semi_major_axis_km = 26000", "preset_semi_major_axis_km = 26000", "relativity.preset_semi_major_axis_km", "is used only with relativity.frequency_offset = \"preset\"" },
        { "frequency_offset = \"missed\"\nfrequency_offset_factor = 0.5", "frequency_offset_factor = 0.5", "relativity.frequency_offset_factor", "has no effect with relativity.frequency_offset = \"missed\"" },
        { "eccentricity_term = \"missed\"\neccentricity_factor = 0.5", "eccentricity_factor = 0.5", "relativity.eccentricity_factor", "has no effect with relativity.eccentricity_term = \"missed\"" },
    };

    [Theory]
    [MemberData(nameof(BadTables))]
    public void A_bad_relativity_value_is_named_with_its_key_and_line(string table, string badLine, string key, string problem)
    {
        var text = ScenarioText.Valid + "[relativity]\n" + table + "\n";

        var error = ScenarioText.SingleError(text, key, ScenarioText.LineOf(text, badLine));

        Assert.Contains(problem, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_shell_preset_without_preset_mode_is_named_on_the_shell()
    {
        var text = ScenarioText.With("semi_major_axis_km = 27600", "semi_major_axis_km = 27600\nrelativity_preset_semi_major_axis_km = 29600")
            + "[relativity]\nfrequency_offset = \"missed\"\n";

        var error = ScenarioText.SingleError(text, "shell[1].relativity_preset_semi_major_axis_km",
            ScenarioText.LineOf(text, "relativity_preset_semi_major_axis_km = 29600"));

        Assert.Contains("is used only with relativity.frequency_offset = \"preset\" (here \"missed\")", error.Message, StringComparison.Ordinal);
    }
}

using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Scenarios;

public class ScenarioDefaultsTests
{
    // Defaults and conversions are exact in binary floating point except where a tolerance is named.
    private const double ExactTolerance = 0.0;

    // A few units in the last place near 1e-4 (one ulp there is 1.4e-20): 0.36 / 3600 rounds twice.
    private const double RateTolerance = 1e-19;

    [Fact]
    public void Keys_left_out_take_their_documented_defaults()
    {
        var scenario = ScenarioLoader.Load(ScenarioText.Valid, ScenarioText.Source);

        Assert.Equal(1UL, scenario.Run.Seed);
        Assert.Equal(new DateTimeOffset(2031, 6, 1, 0, 0, 0, TimeSpan.Zero), scenario.Run.StartUtc);
        var shell = Assert.Single(scenario.Shells);
        Assert.Equal("shell-1", shell.Name);
        Assert.Equal(0.0, shell.Eccentricity, ExactTolerance);
        Assert.Equal(0.0, shell.ArgumentOfPerigeeDeg, ExactTolerance);
        Assert.Equal(0.0, shell.RaanOffsetDeg, ExactTolerance);
        Assert.Equal(0.0, shell.MeanAnomalyOffsetDeg, ExactTolerance);
        Assert.Equal(new GridSpec(30, 30, -90, 90, -180, 180, 0, 10), scenario.Grid);
        Assert.Equal(new OrbitErrorSpec(0.3, 1.5, 0.8), scenario.Orbit);
        var user = new UserEnvironmentSpec(IonosphereMode.DualFrequency, 2.0, FrequencyPair.L1L5, 0.12, MultipathModel.Airborne, 0.36);
        Assert.Equal(user, scenario.User);
        Assert.Equal(new AssumedModelSpec(1.0, user), scenario.Assumed);
        Assert.Equal(0.5, scenario.Clock.UploadSigmaMeters, ExactTolerance);
    }

    [Fact]
    public void The_mask_defaults_to_five_degrees()
    {
        var scenario = ScenarioLoader.Load(ScenarioText.With("mask_deg = 10", ""), ScenarioText.Source);

        Assert.Equal(5.0, scenario.Grid.MaskDeg, ExactTolerance);
    }

    [Fact]
    public void Kilometres_and_hours_are_converted_to_metres_and_seconds()
    {
        var text = ScenarioText.Valid + "[clock]\ngrowth_sigma_m_per_h = 0.36\nupload_interval_h = 6\n";

        var scenario = ScenarioLoader.Load(text, ScenarioText.Source);

        // Derived from 1 km = 1000 m and 1 h = 3600 s.
        Assert.Equal(27_600_000.0, scenario.Shells[0].SemiMajorAxisMeters, ExactTolerance);
        Assert.Equal(7200.0, scenario.Run.DurationSeconds, ExactTolerance);
        Assert.Equal(600.0, scenario.Run.StepSeconds, ExactTolerance);
        Assert.Equal(1e-4, scenario.Clock.GrowthSigmaMetersPerSecond, RateTolerance);
        Assert.Equal(21_600.0, scenario.Clock.UploadIntervalSeconds, ExactTolerance);
    }

    [Fact]
    public void Default_clock_growth_and_interval_are_converted_too()
    {
        var scenario = ScenarioLoader.Load(ScenarioText.Valid, ScenarioText.Source);

        // 0.2 m/h / 3600 s/h and 12 h * 3600 s/h (derived from the unit definitions).
        Assert.Equal(0.2 / 3600.0, scenario.Clock.GrowthSigmaMetersPerSecond, ExactTolerance);
        Assert.Equal(43_200.0, scenario.Clock.UploadIntervalSeconds, ExactTolerance);
    }

    [Fact]
    public void Assumed_keys_left_out_are_inherited_from_the_user_block()
    {
        var text = ScenarioText.Valid
            + "[user]\nionosphere = \"single-frequency\"\nnoise_sigma_m = 0.5\nmultipath = \"ground\"\n"
            + "[assumed]\nure_sigma_m = 1.5\nnoise_sigma_m = 1.0\n";

        var scenario = ScenarioLoader.Load(text, ScenarioText.Source);

        Assert.Equal(0.5, scenario.User.NoiseSigmaMeters, ExactTolerance);
        Assert.Equal(1.5, scenario.Assumed.UreSigmaMeters, ExactTolerance);
        Assert.Equal(scenario.User with { NoiseSigmaMeters = 1.0 }, scenario.Assumed.User);
        Assert.Equal(IonosphereMode.SingleFrequency, scenario.Assumed.User.Ionosphere);
        Assert.Equal(MultipathModel.Ground, scenario.Assumed.User.Multipath);
    }

    [Fact]
    public void Integers_are_accepted_where_a_number_is_needed_and_the_counts_follow()
    {
        var scenario = ScenarioLoader.Load(ScenarioText.Valid, ScenarioText.Source);

        Assert.Equal(55.0, scenario.Shells[0].InclinationDeg, ExactTolerance);
        Assert.Equal(12, scenario.Run.Epochs);      // 7200 s / 600 s
        Assert.Equal(72, scenario.Grid.Cells);      // (180 / 30) x (360 / 30)
        Assert.Equal(12, scenario.TotalSatellites);
    }

    [Fact]
    public void A_start_with_an_offset_or_as_a_toml_datetime_is_kept_as_utc()
    {
        var quoted = ScenarioText.With("trials = 10", "trials = 10\nstart_utc = \"2031-06-01T02:30:00+02:00\"");
        var native = ScenarioText.With("trials = 10", "trials = 10\nstart_utc = 2031-06-01T00:30:00Z");

        var expected = new DateTimeOffset(2031, 6, 1, 0, 30, 0, TimeSpan.Zero);
        Assert.Equal(expected, ScenarioLoader.Load(quoted, ScenarioText.Source).Run.StartUtc);
        Assert.Equal(TimeSpan.Zero, ScenarioLoader.Load(quoted, ScenarioText.Source).Run.StartUtc.Offset);
        Assert.Equal(expected, ScenarioLoader.Load(native, ScenarioText.Source).Run.StartUtc);
    }

    [Fact]
    public void The_scenario_keeps_its_source_text_and_name()
    {
        var scenario = ScenarioLoader.Load(ScenarioText.Valid, "mine.toml");

        Assert.Equal(ScenarioText.Valid, scenario.SourceText);
        Assert.Equal("mine.toml", scenario.SourceName);
    }

    [Fact]
    public void Unnamed_shells_are_numbered_from_one()
    {
        var text = ScenarioText.Valid + "[[shell]]\nsatellites = 3\nplanes = 3\ninclination_deg = 50\nsemi_major_axis_km = 42164\n";

        var scenario = ScenarioLoader.Load(text, ScenarioText.Source);

        Assert.Equal(["shell-1", "shell-2"], scenario.Shells.Select(s => s.Name));
    }
}

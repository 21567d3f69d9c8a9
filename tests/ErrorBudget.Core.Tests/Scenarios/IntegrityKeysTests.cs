using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Scenarios;

/// <summary>[integrity] and [faults]: presets, defaults, and the cross-key rules with their messages (issue 5).</summary>
public class IntegrityKeysTests
{
    private static Scenario Load(string tables) => ScenarioLoader.Load(ScenarioText.Valid + "\n" + tables, "test.toml");

    [Fact]
    public void Without_an_integrity_table_a_scenario_has_no_integrity_and_no_faults()
    {
        var s = ScenarioLoader.Load(ScenarioText.Valid, "test.toml");
        Assert.Null(s.Integrity);
        Assert.Null(s.Faults);
    }

    [Fact]
    public void A_preset_brings_the_icao_alert_limits_and_accuracy_and_the_araim_baseline_defaults()
    {
        // ICAO Annex 10 Table 3.7.2.4-1 as reproduced in REFERENCE-VALUES section 6: APV-II 40/20 m, 16/8 m.
        var i = Load("[integrity]\nservice = \"apv-ii\"\nprotection_levels = \"araim\"\nura_sigma_m = 1.2\n").Integrity!;
        Assert.Equal(40.0, i.HorizontalAlertLimitMeters);
        Assert.Equal(20.0, i.VerticalAlertLimitMeters);
        Assert.Equal(16.0, i.HorizontalAccuracy95Meters);
        Assert.Equal(8.0, i.VerticalAccuracy95Meters);
        Assert.Equal(ProtectionLevelMethod.Araim, i.Method);
        Assert.Equal(1.2, i.Araim.UraSigmaMeters);
        Assert.Equal(0.8, i.Araim.UreSigmaMeters, 12); // 2/3 of sigma_URA (ATSG practice, from memory)
        Assert.Equal(1e-5, i.Araim.SatelliteFaultPrior);
        Assert.Equal(9.8e-8, i.Araim.PhmiVertical);
    }

    [Fact]
    public void A_custom_service_without_val_is_horizontal_only()
    {
        var i = Load("[integrity]\nservice = \"custom\"\nhal_m = 100\n").Integrity!;
        Assert.Equal(100.0, i.HorizontalAlertLimitMeters);
        Assert.False(i.HasVertical);
    }

    [Fact]
    public void An_alert_limit_beside_a_preset_is_rejected_naming_the_preset()
    {
        string text = ScenarioText.Valid + "\n[integrity]\nservice = \"npa\"\nval_m = 30\n";
        var error = ScenarioText.SingleError(text, "integrity.val_m", ScenarioText.LineOf(text, "val_m = 30"));
        Assert.Contains("is set by the preset integrity.service = \"npa\"", error.Message);
    }

    [Fact]
    public void An_accuracy_sigma_above_the_integrity_sigma_is_rejected()
    {
        string text = ScenarioText.Valid + "\n[integrity]\nprotection_levels = \"araim\"\nura_sigma_m = 1\nure_sigma_m = 1.5\n";
        var error = ScenarioText.SingleError(text, "integrity.ure_sigma_m", ScenarioText.LineOf(text, "ure_sigma_m = 1.5"));
        Assert.Equal("ure_sigma_m <= ura_sigma_m", error.Allowed);
    }

    [Fact]
    public void A_fault_range_with_its_minimum_above_its_maximum_is_rejected()
    {
        string text = ScenarioText.Valid + "\n[faults]\nclock_step_per_h = 0.1\nclock_step_min_m = 50\nclock_step_max_m = 20\n";
        var error = ScenarioText.SingleError(text, "faults.clock_step_min_m", ScenarioText.LineOf(text, "clock_step_min_m = 50"));
        Assert.Equal("clock_step_min_m <= clock_step_max_m", error.Allowed);
    }

    [Fact]
    public void A_negative_fault_rate_is_out_of_range()
    {
        string text = ScenarioText.Valid + "\n[faults]\norbit_per_h = -1\n";
        var error = ScenarioText.SingleError(text, "faults.orbit_per_h", ScenarioText.LineOf(text, "orbit_per_h = -1"));
        Assert.Contains("0", error.Allowed);
    }

    [Fact]
    public void More_batches_than_trials_is_rejected()
    {
        string text = ScenarioText.With("trials = 10", "trials = 10\nbatches = 11");
        var errors = ScenarioText.Errors(text);
        Assert.Contains(errors, e => e.Key == "run.batches" && e.Allowed == "1 <= batches <= 10");
    }
}

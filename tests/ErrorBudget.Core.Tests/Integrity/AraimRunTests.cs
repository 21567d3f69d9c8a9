using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;
using Xunit.Abstractions;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// Issue 5, end to end with ARAIM protection levels: injected large clock steps are detected and
/// excluded, while a fault-free run raises alarms only at the false-alarm budget's rate
/// (P_FA_VERT + P_FA_HOR = 3.99e-6 per sample, WG-C ARAIM ADD v3.0 allocations, from memory).
/// </summary>
public sealed class AraimRunTests(ITestOutputHelper output)
{
    private static string Scenario(string faults) => $"""
        [run]
        seed = 17
        trials = 200
        duration_h = 4
        step_s = 900

        [[shell]]
        name = "halo"
        satellites = 30
        planes = 5
        phasing = 1
        inclination_deg = 56
        semi_major_axis_km = 27800

        [[shell]]
        name = "rime"
        satellites = 24
        planes = 3
        phasing = 1
        inclination_deg = 55
        semi_major_axis_km = 29600
        raan_offset_deg = 60

        [grid]
        lat_step_deg = 30
        lon_step_deg = 45
        mask_deg = 5

        [clock]
        upload_sigma_m = 0.4
        growth_sigma_m_per_h = 0.02

        [user]
        ionosphere = "dual-frequency"

        [integrity]
        service = "lpv-200"
        protection_levels = "araim"
        ura_sigma_m = 1.0
        overbound_trials = 0

        {faults}
        """;

    private async Task<IntegrityReport> Run(string text)
    {
        var result = await MonteCarloEngine.RunAsync(ScenarioLoader.Load(text, "araim.toml"), new RunOptions { Threads = 2 }, CancellationToken.None);
        var g = result.Integrity!.Global;
        output.WriteLine($"samples {g.Detections.Samples}, detections {g.Detections.Events}, exclusions {g.Exclusions}, faulted {g.FaultedSamples}, missed {g.MissedDetections.Events}, availability {g.Availability:F3}");
        return result.Integrity;
    }

    [Fact]
    public async Task Large_injected_clock_steps_are_detected_and_excluded()
    {
        var report = await Run(Scenario("""
            [faults]
            clock_step_per_h = 0.02
            clock_step_min_m = 300
            clock_step_max_m = 600
            """));
        var g = report.Global;
        Assert.True(g.FaultedSamples > 1000, $"{g.FaultedSamples} faulted samples");
        // A 300 m step is over 30 separation sigmas on any redundant geometry: at most a few in a
        // thousand faulted samples may slip through (e.g. at a cell with too little redundancy).
        Assert.True(g.MissedDetections.Upper < 0.01, $"missed-detection rate upper bound {g.MissedDetections.Upper}");
        Assert.True(g.Exclusions > 0.9 * g.FaultedSamples, $"{g.Exclusions} exclusions of {g.FaultedSamples} faulted samples");
    }

    [Fact]
    public async Task A_fault_free_run_alarms_no_more_than_the_false_alarm_budget_allows()
    {
        var report = await Run(Scenario(""));
        var g = report.Global;
        Assert.Equal(0, g.FaultedSamples);
        // The 95 % Clopper-Pearson interval of the alarm rate must reach down to the budget or below.
        Assert.True(g.Detections.Lower <= 3.99e-6, $"alarm rate interval [{g.Detections.Lower}, {g.Detections.Upper}]");
    }
}

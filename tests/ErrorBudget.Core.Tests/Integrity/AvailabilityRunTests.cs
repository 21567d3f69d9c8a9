using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;
using Xunit.Abstractions;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// Issue 5, end to end: service availability (PL &lt;= AL) falls as the elevation mask rises and grows
/// with the number of satellites (more and better-spread lines of sight shrink d_U and d_major:
/// common practice).
/// </summary>
public sealed class AvailabilityRunTests(ITestOutputHelper output)
{
    private static string Scenario(int satellites, int planes, double maskDeg, string method = "weighted") => $"""
        [run]
        seed = 5
        trials = 2
        duration_h = 12
        step_s = 900

        [[shell]]
        name = "halo"
        satellites = {satellites}
        planes = {planes}
        phasing = 1
        inclination_deg = 56
        semi_major_axis_km = 27800

        [grid]
        lat_step_deg = 15
        lon_step_deg = 30
        mask_deg = {maskDeg}

        [assumed]
        ure_sigma_m = 1.5

        [integrity]
        service = "apv-ii"
        protection_levels = "{method}"
        overbound_trials = 0
        """;

    private async Task<double> Availability(string text, string label)
    {
        var result = await MonteCarloEngine.RunAsync(ScenarioLoader.Load(text, "availability.toml"), new RunOptions { Threads = 2 }, CancellationToken.None);
        double availability = result.Integrity!.Global.Availability;
        output.WriteLine($"{label}: availability {availability:F4}, coverage {result.Integrity.Global.Coverage:F4}");
        return availability;
    }

    [Fact]
    public async Task Availability_falls_as_the_mask_rises()
    {
        double low = await Availability(Scenario(24, 3, 5), "mask 5");
        double mid = await Availability(Scenario(24, 3, 15), "mask 15");
        double high = await Availability(Scenario(24, 3, 25), "mask 25");
        Assert.True(low > mid && mid > high, $"{low} > {mid} > {high}");
        Assert.True(low - high > 0.05, "the mask changes availability by more than 5 points");
    }

    [Fact]
    public async Task Availability_grows_with_the_number_of_satellites()
    {
        double few = await Availability(Scenario(18, 3, 10), "18 satellites");
        double some = await Availability(Scenario(24, 3, 10), "24 satellites");
        double many = await Availability(Scenario(36, 6, 10), "36 satellites");
        Assert.True(few < some && some < many, $"{few} < {some} < {many}");
    }
}

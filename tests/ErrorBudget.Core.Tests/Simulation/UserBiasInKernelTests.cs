using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Core.Tests.Simulation;

/// <summary>Missed user-level relativistic terms reach the position through the kernel's common offset.</summary>
public sealed class UserBiasInKernelTests
{
    private static string Scenario(string sagnac) => $"""
        [run]
        trials = 4
        duration_h = 2
        step_s = 1800

        [[shell]]
        satellites = 24
        planes = 3
        phasing = 1
        inclination_deg = 55
        semi_major_axis_km = 26560

        [grid]
        lat_step_deg = 30
        lon_step_deg = 60
        mask_deg = 5

        [clock]
        upload_sigma_m = 0
        growth_sigma_m_per_h = 0

        [orbit]
        radial_sigma_m = 0
        along_sigma_m = 0
        cross_sigma_m = 0

        [user]
        ionosphere = "dual-frequency"
        tropo_zenith_sigma_m = 0
        multipath = "none"
        noise_sigma_m = 0

        [relativity]
        sagnac = "{sagnac}"
        """;

    [Fact]
    public async Task A_missed_sagnac_correction_moves_every_position_and_an_applied_one_does_not()
    {
        var applied = await MonteCarloEngine.RunAsync(ScenarioLoader.Load(Scenario("applied"), "a.toml"), new RunOptions(), CancellationToken.None);
        var missed = await MonteCarloEngine.RunAsync(ScenarioLoader.Load(Scenario("missed"), "m.toml"), new RunOptions(), CancellationToken.None);

        // With every random error at zero the position error is exactly S b: zero when nothing is missed.
        Assert.All(applied.Cells, c => Assert.Equal(0.0, c.Hpe.P50));
        // The Sagnac range term is up to ~133 ns (40 m) for a GPS-like orbit (REFERENCE-VALUES 1.5, Ashby 2003),
        // and it is not common to all satellites, so positions move by metres, bounded by DOP x 40 m.
        Assert.InRange(missed.Global.Hpe.P95, 0.5, 200.0);
        Assert.All(missed.Cells, c => Assert.True(c.Hpe.P50 > 0.01, $"cell {c.CellIndex}: HPE p50 {c.Hpe.P50}"));
    }
}

using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;
using Xunit.Abstractions;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// Issue 5, end to end: the overbounding check (DeCleene's two-sided CDF overbound, see
/// OverboundAnalysis) finds an inflation of about 1 when the truth equals the assumed model, about the
/// true sigma ratio when the truth is wider, and fails for the satellites whose relativistic frequency
/// offset was set for another orbit.
/// </summary>
public sealed class OverboundRunTests(ITestOutputHelper output)
{
    private const string Service = """
        [integrity]
        service = "apv-i"
        overbound_trials = 64
        """;

    private async Task<IReadOnlyList<OverboundRow>> Run(string text)
    {
        var scenario = ScenarioLoader.Load(text, "overbound.toml");
        var result = await MonteCarloEngine.RunAsync(scenario, new RunOptions { Threads = 2 }, CancellationToken.None);
        var rows = result.Integrity!.Overbound;
        foreach (var r in rows)
        {
            output.WriteLine($"{r.Shell} {r.ElevationLowDeg}-{r.ElevationHighDeg}: n {r.Samples}, mean {r.Mean:F3}, sigma ratio {r.SigmaRatio:F3}, k {r.RequiredInflation:F3} +- {r.SamplingTolerance:F3}, bounded {r.Bounded}");
        }

        return rows;
    }

    private static List<OverboundRow> WithVerdict(IEnumerable<OverboundRow> rows) => [.. rows.Where(r => !double.IsNaN(r.RequiredInflation))];

    [Theory]
    [InlineData(1.0)]
    [InlineData(2.0)]
    public async Task The_required_inflation_is_the_true_sigma_ratio_in_every_elevation_bin(double ratio)
    {
        // 72 cells x 12 epochs x 64 trials x ~8 satellites: 1e4 to 1e5 samples per 10-degree bin.
        var rows = WithVerdict(await Run(IntegrityScenarios.GaussianTruth(64, 2, 600, ratio, Service)));
        Assert.True(rows.Count >= 4, $"{rows.Count} bins with a verdict");
        foreach (var r in rows)
        {
            // The row's own sampling tolerance (a union bound at false-alarm 1e-3 over its edges).
            Assert.InRange(r.RequiredInflation, ratio * (1 - r.SamplingTolerance), ratio * (1 + r.SamplingTolerance));
        }
    }

    [Fact]
    public async Task A_frequency_offset_preset_for_another_orbit_fails_the_overbound_only_for_that_shell()
    {
        // Shell "rime" (a = 23,500 km) carries the offset preset for "halo"'s 27,800 km orbit and no
        // ground absorption: its clocks drift by (Net(23,500) - Net(27,800)) c t, with
        // Net(a) = L_G - 3 GM / (2 a c^2): 0.44e-10 c, about 47 m per hour (see the Relativity tests).
        string text = IntegrityScenarios.GaussianTruth(64, 4, 1200, 1.0, Service)
            .Replace("""
                semi_major_axis_km = 27800
                """, """
                semi_major_axis_km = 27800
                relativity_preset_semi_major_axis_km = 27800

                [[shell]]
                name = "rime"
                satellites = 18
                planes = 3
                phasing = 1
                inclination_deg = 60
                semi_major_axis_km = 23500
                raan_offset_deg = 60
                relativity_preset_semi_major_axis_km = 27800
                """)
            + """

            [relativity]
            frequency_offset = "preset"
            ground_absorbs = "none"
            """;
        var rows = WithVerdict(await Run(text));
        var halo = rows.Where(r => r.Shell == "halo").ToList();
        var rime = rows.Where(r => r.Shell == "rime").ToList();
        Assert.NotEmpty(halo);
        Assert.NotEmpty(rime);
        Assert.All(halo, r => Assert.True(r.RequiredInflation <= 1 + r.SamplingTolerance, $"halo {r.ElevationLowDeg}: k {r.RequiredInflation}"));
        Assert.All(rime, r => Assert.True(r.RequiredInflation > 1 + r.SamplingTolerance, $"rime {r.ElevationLowDeg}: k {r.RequiredInflation}"));
    }
}

using System.Text.Json;

namespace ErrorBudget.Cli.Tests;

public sealed class CheckAndBenchTests
{
    [Fact]
    public async Task Check_prints_orbits_visibility_samples_and_estimates_without_writing()
    {
        var (code, stdout, err) = await CliRunner.RunAsync("check", CliRunner.ScenarioPath("w1.toml"));
        Assert.True(code == 0, err);
        Assert.Contains("30 satellites", stdout);
        Assert.Contains("2592 users", stdout);
        Assert.Contains("288 epochs", stdout);
        Assert.Contains("satellites in view", stdout);
        Assert.Contains("74,649,600 user-solutions", stdout); // 2592 x 288 x 100
        Assert.Contains("estimate", stdout);
    }

    [Fact]
    public async Task Check_prints_the_relativity_figures_per_shell_and_the_position_cost_of_the_mistake()
    {
        // Issue 4. Net offsets from SecularRate (L_G - 3GM/(2 a c^2)): +4.5763e-10 at 27,800 km, +4.1384e-10 at 23,500 km.
        var (code, stdout, err) = await CliRunner.RunAsync("check", CliRunner.ScenarioPath("relativity-two-shells.toml"));
        Assert.True(code == 0, err);
        Assert.Contains("relativity: frequency_offset missed", stdout);
        Assert.Contains("ground absorbs none", stdout);
        Assert.Contains("halo: offsets SR -0.7977 GR +5.3740 net +4.5763 x 1e-10", stdout);
        Assert.Contains("rime: offsets SR -0.9436 GR +5.0820 net +4.1384 x 1e-10", stdout);
        Assert.Contains("+39.539 us/day", stdout);
        Assert.Contains("position error of the missed terms alone", stdout);
    }

    [Fact]
    public async Task Bench_json_prints_one_object_with_the_tracked_fields()
    {
        var (code, stdout, err) = await CliRunner.RunAsync("bench", "--json", "--trials", "1", "--threads", "2");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        Assert.Equal("w1", root.GetProperty("workload").GetString());
        Assert.True(root.GetProperty("user_solutions_per_second").GetDouble() > 0);
        Assert.True(root.GetProperty("peak_memory_bytes").GetInt64() > 0);
        Assert.Equal(2, root.GetProperty("threads").GetInt32());
        Assert.Equal(2592L * 288, root.GetProperty("user_solutions").GetInt64());
        // Issue 6: the per-stage split and the parallel efficiency; issue 5: the ARAIM algorithm's own cost.
        var stages = root.GetProperty("stage_seconds");
        foreach (string stage in new[] { "satellite_errors", "geometry", "user_normals", "projection", "sketches", "integrity", "writing" })
        {
            Assert.True(stages.GetProperty(stage).GetDouble() >= 0, stage);
        }

        Assert.True(stages.GetProperty("geometry").GetDouble() > 0);
        Assert.InRange(root.GetProperty("parallel_efficiency").GetDouble(), 0.05, 1.5);
        // Three alternating warm pairs by default, each with its own figure.
        var byRound = root.GetProperty("parallel_efficiency_by_round").EnumerateArray().Select(e => e.GetDouble()).ToArray();
        Assert.Equal(3, byRound.Length);
        Assert.All(byRound, e => Assert.InRange(e, 0.05, 1.5));
        Assert.True(root.GetProperty("warm_user_solutions_per_second").GetDouble() > 0);
        Assert.True(root.GetProperty("araim_evaluate_us_per_user_epoch").GetDouble() > 0);
        Assert.True(root.GetProperty("araim_test_us_per_trial").GetDouble() > 0);
    }

    [Fact]
    public async Task Bench_json_with_one_thread_has_a_warm_rate_and_a_null_efficiency()
    {
        // Found by hand: a one-thread bench has no parallel efficiency, and writing NaN made the JSON writer fail.
        var (code, stdout, err) = await CliRunner.RunAsync("bench", "--json", "--trials", "1", "--threads", "1");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(stdout);
        var root = doc.RootElement;
        Assert.Equal(1, root.GetProperty("threads").GetInt32());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("parallel_efficiency").ValueKind);
        Assert.Empty(root.GetProperty("parallel_efficiency_by_round").EnumerateArray());
        Assert.True(root.GetProperty("warm_user_solutions_per_second").GetDouble() > 0);
    }

    [Theory]
    [InlineData("0")]
    [InlineData("21")]
    public async Task Bench_refuses_a_round_count_out_of_range(string rounds)
    {
        var (code, stdout, err) = await CliRunner.RunAsync("bench", "--json", "--rounds", rounds);
        Assert.Equal(2, code);
        Assert.Contains($"--rounds {rounds} is out of range; allowed: 1 <= --rounds <= 20", err);
        Assert.Equal("", stdout);
    }
}

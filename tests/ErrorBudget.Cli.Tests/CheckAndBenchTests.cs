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
    }
}

using System.Text.Json;
using DuckDB.NET.Data;

namespace ErrorBudget.Cli.Tests;

public sealed class RunCommandTests
{
    [Fact]
    public async Task Smoke_scenario_runs_end_to_end_and_every_table_reads_back_in_duckdb()
    {
        string root = CliRunner.NewTempFolder();
        string outDir = Path.Combine(root, "smoke");
        var (code, stdout, stderr) = await CliRunner.RunAsync("run", CliRunner.ScenarioPath("smoke.toml"), "--out", outDir, "--quiet");
        Assert.True(code == 0, stderr);
        Assert.Contains("VPE", stdout);
        Assert.Contains("certify nothing", stdout);

        using var summary = JsonDocument.Parse(await File.ReadAllTextAsync(Path.Combine(outDir, "summary.json")));
        int cells = summary.RootElement.GetProperty("cells").GetInt32();
        int epochs = summary.RootElement.GetProperty("epochs").GetInt32();
        Assert.True(cells > 0 && epochs > 0);

        // An independent reader (DuckDB) sees the rows the summary announces.
        using var db = new DuckDBConnection("DataSource=:memory:");
        db.Open();
        using var cmd = db.CreateCommand();
        cmd.CommandText = $"SELECT count(*), CAST(sum(samples) AS BIGINT), min(hpe_p50_m) FROM '{Path.Combine(outDir, "cells.parquet")}'";
        using (var reader = cmd.ExecuteReader())
        {
            Assert.True(reader.Read());
            Assert.Equal(cells, reader.GetInt64(0));
            Assert.Equal(summary.RootElement.GetProperty("samples").GetInt64(), reader.GetInt64(1));
            Assert.True(reader.GetDouble(2) > 0);
        }

        cmd.CommandText = $"SELECT count(*) FROM '{Path.Combine(outDir, "epochs.parquet")}'";
        Assert.Equal((long)epochs, Convert.ToInt64(cmd.ExecuteScalar()));
        Assert.Equal([outDir], Directory.GetDirectories(root)); // no temporary folder left beside it
    }

    [Fact]
    public async Task Same_seed_gives_byte_identical_tables_for_one_and_two_threads()
    {
        string root = CliRunner.NewTempFolder();
        string one = Path.Combine(root, "t1"), two = Path.Combine(root, "t2");
        Assert.Equal(0, (await CliRunner.RunAsync("run", CliRunner.ScenarioPath("smoke.toml"), "--out", one, "--threads", "1", "-q")).Code);
        Assert.Equal(0, (await CliRunner.RunAsync("run", CliRunner.ScenarioPath("smoke.toml"), "--out", two, "--threads", "2", "-q")).Code);
        foreach (var table in new[] { "cells.parquet", "epochs.parquet", "clocks.parquet", "age_of_data.parquet" })
        {
            Assert.Equal(await File.ReadAllBytesAsync(Path.Combine(one, table)), await File.ReadAllBytesAsync(Path.Combine(two, table)));
        }
    }

    [Fact]
    public async Task An_existing_result_set_is_kept_unless_force_is_given()
    {
        string outDir = Path.Combine(CliRunner.NewTempFolder(), "r");
        Directory.CreateDirectory(outDir);
        string marker = Path.Combine(outDir, "keep.txt");
        await File.WriteAllTextAsync(marker, "user data");

        var (code, _, err) = await CliRunner.RunAsync("run", CliRunner.ScenarioPath("smoke.toml"), "--out", outDir, "-q");
        Assert.Equal(2, code);
        Assert.Contains("--force", err);
        Assert.True(File.Exists(marker));

        (code, _, err) = await CliRunner.RunAsync("run", CliRunner.ScenarioPath("smoke.toml"), "--out", outDir, "-q", "--force");
        Assert.True(code == 0, err);
        Assert.False(File.Exists(marker));
        Assert.True(File.Exists(Path.Combine(outDir, "cells.parquet")));
    }

    [Fact]
    public async Task Seed_and_trials_options_override_the_scenario_and_are_recorded()
    {
        string outDir = Path.Combine(CliRunner.NewTempFolder(), "o");
        var (code, _, err) = await CliRunner.RunAsync("run", CliRunner.ScenarioPath("smoke.toml"), "--out", outDir, "-q", "--seed", "99", "--trials", "3");
        Assert.True(code == 0, err);
        using var summary = JsonDocument.Parse(await File.ReadAllTextAsync(Path.Combine(outDir, "summary.json")));
        Assert.Equal(99, summary.RootElement.GetProperty("seed").GetInt64());
        Assert.Equal(3, summary.RootElement.GetProperty("trials").GetInt32());
    }
}

using DuckDB.NET.Data;

namespace ErrorBudget.Cli.Tests;

/// <summary>Issue 5 through the command line: an integrity run reports availability and writes tables DuckDB reads back.</summary>
public sealed class IntegrityCliTests
{
    private static async Task<string> SmallCopy(string root, string scenario, params (string From, string To)[] edits)
    {
        string text = await File.ReadAllTextAsync(CliRunner.ScenarioPath(scenario));
        foreach (var (from, to) in edits)
        {
            Assert.Contains(from, text);
            text = text.Replace(from, to, StringComparison.Ordinal);
        }

        string file = Path.Combine(root, "small.toml");
        await File.WriteAllTextAsync(file, text);
        return file;
    }

    [Fact]
    public async Task An_integrity_run_reports_the_service_and_writes_availability_integrity_and_overbound_tables()
    {
        string root = CliRunner.NewTempFolder();
        string file = await SmallCopy(root, "integrity-demo.toml",
            ("trials = 1000", "trials = 20"), ("lat_step_deg = 10", "lat_step_deg = 30"), ("lon_step_deg = 10", "lon_step_deg = 30"));
        string outDir = Path.Combine(root, "out");

        var (code, stdout, err) = await CliRunner.RunAsync("run", file, "--out", outDir, "-q");

        Assert.True(code == 0, err);
        Assert.Contains("integrity  lpv-200, HAL 40 m, VAL 35 m, weighted protection levels", stdout);
        Assert.Contains("not a certified integrity monitor", stdout);
        using var db = new DuckDBConnection("DataSource=:memory:");
        db.Open();
        using var cmd = db.CreateCommand();
        // 6 x 12 cells; each sample is counted once per axis in the diagram.
        cmd.CommandText = $"SELECT count(*), CAST(sum(samples) AS BIGINT), min(availability) FROM '{Path.Combine(outDir, "availability.parquet")}'";
        long samples;
        using (var reader = cmd.ExecuteReader())
        {
            Assert.True(reader.Read());
            Assert.Equal(72L, reader.GetInt64(0));
            samples = reader.GetInt64(1);
            Assert.Equal(72L * 72 * 20, samples);
            Assert.InRange(reader.GetDouble(2), 0.0, 1.0);
        }

        cmd.CommandText = $"SELECT axis, CAST(sum(count) AS BIGINT), min(alert_limit_m) FROM '{Path.Combine(outDir, "integrity.parquet")}' GROUP BY axis ORDER BY axis";
        using (var reader = cmd.ExecuteReader())
        {
            Assert.True(reader.Read());
            Assert.Equal("horizontal", reader.GetString(0));
            Assert.Equal(samples, reader.GetInt64(1));
            Assert.Equal(40.0, reader.GetDouble(2));
            Assert.True(reader.Read());
            Assert.Equal("vertical", reader.GetString(0));
            Assert.Equal(samples, reader.GetInt64(1));
            Assert.Equal(35.0, reader.GetDouble(2));
        }

        // overbound_trials = 8 of 20 trials, every visible satellite of every user-epoch.
        cmd.CommandText = $"SELECT count(DISTINCT shell), CAST(sum(samples) AS BIGINT) FROM '{Path.Combine(outDir, "overbound.parquet")}'";
        using (var reader = cmd.ExecuteReader())
        {
            Assert.True(reader.Read());
            Assert.Equal(2L, reader.GetInt64(0));
            Assert.True(reader.GetInt64(1) >= 72L * 72 * 8 * 4, $"{reader.GetInt64(1)} overbound samples");
        }
    }

    [Fact]
    public async Task A_custom_service_without_hal_is_rejected_with_the_key_and_exit_code_2_and_no_output()
    {
        string root = CliRunner.NewTempFolder();
        string file = await SmallCopy(root, "integrity-demo.toml", ("service = \"lpv-200\"", "service = \"custom\""));
        string outDir = Path.Combine(root, "out");

        var (code, _, err) = await CliRunner.RunAsync("run", file, "--out", outDir, "-q");

        Assert.Equal(2, code);
        Assert.Contains("integrity.service", err);
        Assert.Contains("integrity.hal_m", err);
        Assert.False(Directory.Exists(outDir));
    }

    [Fact]
    public async Task An_araim_parameter_with_weighted_protection_levels_is_rejected()
    {
        string root = CliRunner.NewTempFolder();
        string file = await SmallCopy(root, "integrity-demo.toml", ("overbound_trials = 8", "overbound_trials = 8\np_sat = 1e-4"));

        var (code, _, err) = await CliRunner.RunAsync("check", file);

        Assert.Equal(2, code);
        Assert.Contains("integrity.p_sat", err);
        Assert.Contains("protection_levels = \"araim\"", err);
    }
}

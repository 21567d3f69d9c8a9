using DuckDB.NET.Data;

namespace ErrorBudget.Cli.Tests;

/// <summary>Issue 3 through the command line: check reports the grade, run writes clocks.parquet and age_of_data.parquet.</summary>
public sealed class ClockGradeCliTests
{
    [Fact]
    public async Task Check_prints_the_grade_allan_deviations_and_the_range_error_after_each_upload_interval()
    {
        var (code, stdout, err) = await CliRunner.RunAsync("check", CliRunner.ScenarioPath("clocks-demo.toml"));

        Assert.True(code == 0, err);
        Assert.Contains("clock: grade rubidium", stdout);
        // Catalogue rubidium: sigma_y(1 s) = 2e-12 (white FM level, ClockCatalogue), sigma_y(100 s) = 2.02e-13.
        Assert.Contains("1 s 2.00E-12, 100 s 2.02E-13", stdout);
        Assert.Contains("1 day", stdout);
        Assert.Contains("predicted range error after one upload interval (2 h)", stdout); // the heron shell
        Assert.Contains("predicted range error after one upload interval (8 h)", stdout);
    }

    [Fact]
    public async Task Check_of_a_custom_grade_reports_the_fit_residual()
    {
        string root = CliRunner.NewTempFolder();
        string file = Path.Combine(root, "custom.toml");
        string text = await File.ReadAllTextAsync(CliRunner.ScenarioPath("clocks-demo.toml"));
        text = text.Replace("grade = \"rubidium\"", "grade = \"custom\"\nadev_tau_s = [1, 100, 10000, 86400]\nadev_sigma = [2e-12, 2.1e-13, 4e-14, 3.5e-14]", StringComparison.Ordinal);
        await File.WriteAllTextAsync(file, text);

        var (code, stdout, err) = await CliRunner.RunAsync("check", file);

        Assert.True(code == 0, err);
        Assert.Contains("clock: grade custom", stdout);
        Assert.Contains("fitted to 4 Allan deviation points: rms relative residual", stdout);
    }

    [Fact]
    public async Task A_graded_run_writes_clock_and_age_of_data_tables_that_read_back_in_duckdb()
    {
        string root = CliRunner.NewTempFolder();
        string file = Path.Combine(root, "small.toml");
        string text = await File.ReadAllTextAsync(CliRunner.ScenarioPath("clocks-demo.toml"));
        await File.WriteAllTextAsync(file, text.Replace("trials = 50", "trials = 2", StringComparison.Ordinal).Replace("lat_step_deg = 6", "lat_step_deg = 30", StringComparison.Ordinal).Replace("lon_step_deg = 6", "lon_step_deg = 30", StringComparison.Ordinal));
        string outDir = Path.Combine(root, "out");

        var (code, _, err) = await CliRunner.RunAsync("run", file, "--out", outDir, "-q");

        Assert.True(code == 0, err);
        using var db = new DuckDBConnection("DataSource=:memory:");
        db.Open();
        using var cmd = db.CreateCommand();
        cmd.CommandText = $"SELECT count(*), min(grade), max(tau_s) FROM '{Path.Combine(outDir, "clocks.parquet")}'";
        using (var reader = cmd.ExecuteReader())
        {
            Assert.True(reader.Read());
            Assert.Equal(8L, reader.GetInt64(0)); // 288 epochs: tau = 300 s x 2^k, 2^k <= 144
            Assert.Equal("rubidium", reader.GetString(1));
            Assert.Equal(300.0 * 128, reader.GetDouble(2));
        }

        // 27 satellites x 288 epochs x 2 trials, every one in some age bin.
        cmd.CommandText = $"SELECT CAST(sum(samples) AS BIGINT), count(*) FROM '{Path.Combine(outDir, "age_of_data.parquet")}'";
        using (var reader = cmd.ExecuteReader())
        {
            Assert.True(reader.Read());
            Assert.Equal(27L * 288 * 2, reader.GetInt64(0));
            Assert.Equal(24L, reader.GetInt64(1));
        }
    }
}

using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Relativity;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Tables;

public class RelativityTableTests
{
    // The column contract of relativity.parquet, written out here on purpose (not taken from the definitions).
    private static readonly string[] ExpectedColumns =
    [
        "satellite_index", "shell", "semi_major_axis_km", "eccentricity",
        "sr_offset_1e10", "gr_offset_1e10", "net_offset_1e10", "sr_us_per_day", "gr_us_per_day", "net_us_per_day",
        "net_range_drift_m_per_day", "applied_offset_1e10", "residual_offset_1e10", "residual_range_drift_m_per_day",
        "periodic_amplitude_ns", "periodic_amplitude_m",
        "frequency_offset_range_rms_m", "frequency_offset_range_max_m", "eccentricity_range_rms_m", "eccentricity_range_max_m",
        "user_epoch_pairs", "sagnac_range_rms_m", "sagnac_range_max_m", "shapiro_range_rms_m", "shapiro_range_max_m",
    ];

    /// <summary>Unit conversions (x 1e10, x 1e9, x 86400 x 1e6) cost a rounding or two.</summary>
    private const double ConversionRelative = 1e-14;

    [Fact]
    public async Task Relativity_table_reads_back_in_DuckDB_with_every_row_and_the_documented_units()
    {
        using var temp = new TempFolder();
        var rows = SyntheticRun.Relativity();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        var path = Path.Combine(temp.Output, ResultSetLayout.RelativityFileName);
        var (columns, read) = DuckDb.Query($"SELECT * FROM {DuckDb.Literal(path)} ORDER BY satellite_index");

        Assert.Equal(ExpectedColumns, columns);
        Assert.Equal(rows.Length, read.Count);
        for (int i = 0; i < rows.Length; i++)
        {
            var r = rows[i];
            var d = read[i];
            Assert.Equal(r.SatelliteIndex, (int)d[0]!);
            Assert.Equal(r.ShellName, (string)d[1]!);
            Near(r.SemiMajorAxisMeters / 1000, d[2]);
            Near(r.NetOffset * 1e10, d[6]);
            Near(r.NetOffset * 86_400 * 1e6, d[9]);
            Near(r.NetOffset * PhysicalConstants.SpeedOfLight * 86_400, d[10]);
            Near(r.ResidualOffset * 1e10, d[12]);
            Near(r.PeriodicAmplitudeSeconds * 1e9, d[14]);
            Near(r.PeriodicAmplitudeSeconds * PhysicalConstants.SpeedOfLight, d[15]);
            Near(r.FrequencyOffset.Rms, d[16]);
            Near(r.FrequencyOffset.MaxAbs, d[17]);
            Assert.Equal(r.Sagnac.Count, (long)d[20]!);
        }

        // Satellite 1: frequency errors -100, -250, -100 -> rms sqrt((1e4 + 6.25e4 + 1e4) / 3), max 250 (exact arithmetic).
        Near(Math.Sqrt(82_500.0 / 3), read[1][16]);
        Near(250.0, read[1][17]);
        // Satellite 2 is seen by no sampled user: the user-level statistics are null, not zero.
        Assert.Equal(0L, (long)read[2][20]!);
        Assert.All(read[2][21..], Assert.Null);
    }

    [Fact]
    public async Task A_result_without_relativity_rows_still_has_the_table_with_every_column()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result() with { Relativity = RelativityReport.Empty }, temp.Output, force: false, CancellationToken.None);

        var path = Path.Combine(temp.Output, ResultSetLayout.RelativityFileName);

        Assert.Equal(ExpectedColumns, DuckDb.Describe(path).Select(c => c.Name));
        Assert.Empty(DuckDb.Query($"SELECT * FROM {DuckDb.Literal(path)}").Rows);
    }

    private static void Near(double expected, object? actual) =>
        Assert.Equal(expected, (double)actual!, Math.Abs(expected) * ConversionRelative);
}

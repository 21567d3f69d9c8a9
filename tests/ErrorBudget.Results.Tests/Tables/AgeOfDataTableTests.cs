using ErrorBudget.Core.Errors;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Tables;

public class AgeOfDataTableTests
{
    // The column contract of age_of_data.parquet, written out here on purpose (not taken from the definitions).
    private static readonly string[] ExpectedColumns =
    [
        "bin_index", "age_min_s", "age_max_s", "age_mean_s", "samples", "clock_range_rms_m", "clock_range_p95_m",
        "clock_range_model_rms_m", "orbit_range_rms_m", "orbit_range_p95_m",
    ];

    [Fact]
    public async Task Age_of_data_table_reads_back_in_DuckDB_with_every_value_and_NaN_as_null()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        var path = Path.Combine(temp.Output, ResultSetLayout.AgeOfDataFileName);
        var (columns, rows) = DuckDb.Query($"SELECT * FROM {DuckDb.Literal(path)} ORDER BY bin_index");

        Assert.Equal(ExpectedColumns, columns);
        var expected = SyntheticRun.AgeOfData();
        Assert.Equal(expected.Length, rows.Count);
        for (int i = 0; i < expected.Length; i++)
        {
            // Tolerance: exact. Parquet DOUBLE stores the IEEE 754 bits unchanged; NaN is written as null.
            Assert.Equal(Expected(expected[i]), rows[i]);
        }
    }

    [Fact]
    public async Task Pooled_clock_rms_comes_out_of_DuckDB_as_the_sample_weighted_mean_square()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        var path = DuckDb.Literal(Path.Combine(temp.Output, ResultSetLayout.AgeOfDataFileName));
        var (_, rows) = DuckDb.Query($"SELECT sqrt(sum(samples * clock_range_rms_m ^ 2) / sum(samples)) FROM {path} WHERE samples > 0");

        // Derived: sqrt((40 x 0.25 + 12 x 0.5625) / 52); tolerance: a few ulps of the sum and root.
        Assert.Equal(Math.Sqrt((40 * 0.25 + 12 * 0.5625) / 52.0), Convert.ToDouble(rows[0][0], System.Globalization.CultureInfo.InvariantCulture), 1e-15);
    }

    private static object?[] Expected(AgeOfDataRow r) =>
    [
        r.BinIndex, r.AgeMinSeconds, r.AgeMaxSeconds, N(r.AgeMeanSeconds), r.Samples, N(r.ClockRangeRmsMeters), N(r.ClockRangeP95Meters),
        N(r.ClockRangeModelRmsMeters), N(r.OrbitRangeRmsMeters), N(r.OrbitRangeP95Meters),
    ];

    private static double? N(double value) => double.IsNaN(value) ? null : value;
}

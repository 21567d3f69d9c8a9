using ErrorBudget.Core.Simulation;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Tables;

public class EpochsTableTests
{
    // The column contract of epochs.parquet, written out here on purpose (not taken from the definitions).
    private static readonly string[] ExpectedColumns =
    [
        "epoch_index", "time_s", "utc", "samples", "unavailable_fraction", "sats_in_view_mean", "pdop_p50", "pdop_p95",
        "hpe_p50_m", "hpe_p95_m", "hpe_p99_m", "hpe_p999_m", "vpe_p50_m", "vpe_p95_m", "vpe_p99_m", "vpe_p999_m",
    ];

    [Fact]
    public async Task Epochs_table_reads_back_in_DuckDB_with_every_row_column_and_value_and_NaN_as_null()
    {
        using var temp = new TempFolder();
        var epochs = SyntheticRun.Epochs();
        await ResultSetWriter.WriteAsync(SyntheticRun.With(SyntheticRun.Cells(), epochs), temp.Output, force: false, CancellationToken.None);

        var path = Path.Combine(temp.Output, ResultSetLayout.EpochsFileName);
        var (columns, rows) = DuckDb.Query($"SELECT * FROM {DuckDb.Literal(path)} ORDER BY epoch_index");

        Assert.Equal(ExpectedColumns, columns);
        Assert.Equal(epochs.Length, rows.Count);
        string[] utc = ["2031-06-01T00:00:00Z", "2031-06-01T00:05:00Z", "2031-06-01T00:10:00Z"];
        for (int i = 0; i < epochs.Length; i++)
        {
            // Tolerance: exact. Parquet DOUBLE stores the IEEE 754 bits unchanged.
            Assert.Equal(Expected(epochs[i], utc[i]), rows[i]);
        }
    }

    [Fact]
    public async Task Utc_column_parses_as_the_same_instant_in_DuckDB()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        var path = DuckDb.Literal(Path.Combine(temp.Output, ResultSetLayout.EpochsFileName));
        var (_, rows) = DuckDb.Query($"SELECT epoch(utc::TIMESTAMP) - epoch(TIMESTAMP '2031-06-01 00:00:00') - time_s FROM {path}");

        // Tolerance: exact; the epochs are whole seconds after the start.
        Assert.All(rows, r => Assert.Equal(0.0, Convert.ToDouble(r[0], System.Globalization.CultureInfo.InvariantCulture)));
    }

    private static object?[] Expected(EpochResult e, string utc) =>
    [
        e.EpochIndex, e.TimeSeconds, utc, e.Samples,
        N(e.UnavailableFraction), N(e.SatsInViewMean), N(e.PdopP50), N(e.PdopP95),
        N(e.Hpe.P50), N(e.Hpe.P95), N(e.Hpe.P99), N(e.Hpe.P999), N(e.Vpe.P50), N(e.Vpe.P95), N(e.Vpe.P99), N(e.Vpe.P999),
    ];

    private static double? N(double value) => double.IsNaN(value) ? null : value;
}

using ErrorBudget.Core.Simulation;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Tables;

public class CellsTableTests
{
    // The column contract of cells.parquet, written out here on purpose (not taken from the definitions).
    private static readonly string[] ExpectedColumns =
    [
        "cell_index", "lat_deg", "lon_deg", "area_weight", "samples", "unavailable_fraction", "sats_in_view_mean",
        "pdop_p50", "pdop_p95", "hdop_p95", "vdop_p95",
        "hpe_p50_m", "hpe_p95_m", "hpe_p99_m", "hpe_p999_m", "vpe_p50_m", "vpe_p95_m", "vpe_p99_m", "vpe_p999_m",
    ];

    [Fact]
    public async Task Cells_table_reads_back_in_DuckDB_with_every_row_column_and_value_and_NaN_as_null()
    {
        using var temp = new TempFolder();
        var cells = SyntheticRun.Cells();
        await ResultSetWriter.WriteAsync(SyntheticRun.With(cells, SyntheticRun.Epochs()), temp.Output, force: false, CancellationToken.None);

        var path = Path.Combine(temp.Output, ResultSetLayout.CellsFileName);
        var (columns, rows) = DuckDb.Query($"SELECT * FROM {DuckDb.Literal(path)} ORDER BY cell_index");

        Assert.Equal(ExpectedColumns, columns);
        Assert.Equal(cells.Length, rows.Count);
        for (int i = 0; i < cells.Length; i++)
        {
            // Tolerance: exact. Parquet DOUBLE stores the IEEE 754 bits unchanged.
            Assert.Equal(Expected(cells[i]), rows[i]);
        }
    }

    [Fact]
    public async Task Cell_without_samples_has_null_figures_but_keeps_its_position_and_weight()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        var path = DuckDb.Literal(Path.Combine(temp.Output, ResultSetLayout.CellsFileName));
        var (_, rows) = DuckDb.Query($"SELECT lat_deg, lon_deg, area_weight, samples, unavailable_fraction, hpe_p50_m, vpe_p999_m FROM {path} WHERE cell_index = 4");

        Assert.Equal(new object?[] { 15.0, 90.0, 0.25, 0L, null, null, null }, Assert.Single(rows));
    }

    [Fact]
    public async Task Small_row_groups_split_the_table_and_DuckDB_still_reads_every_row_in_order()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, rowsPerGroup: 4, CancellationToken.None);

        var info = await ResultSetReader.ReadCellsInfoAsync(temp.Output);
        var (_, rows) = DuckDb.Query($"SELECT cell_index FROM {DuckDb.Literal(info.Path)}");

        Assert.Equal(2, info.RowGroups); // 6 rows in groups of 4: ceil(6 / 4) = 2
        Assert.Equal(Enumerable.Range(0, 6).Cast<object?>(), rows.Select(r => r[0]));
    }

    [Fact]
    public async Task Large_table_is_written_in_several_row_groups_of_the_default_size()
    {
        const int count = 2 * ResultSetLayout.RowsPerGroup + 1;
        var template = SyntheticRun.Cells()[0];
        var cells = Enumerable.Range(0, count).Select(i => template with { CellIndex = i, LatDeg = -90 + 180.0 * i / count }).ToArray();
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.With(cells, SyntheticRun.Epochs()), temp.Output, force: false, CancellationToken.None);

        var info = await ResultSetReader.ReadCellsInfoAsync(temp.Output);
        var (_, rows) = DuckDb.Query($"SELECT count(*), sum(cell_index)::BIGINT, count(hpe_p999_m) FROM {DuckDb.Literal(info.Path)}");

        Assert.Equal(3, info.RowGroups); // ceil((2 * 100,000 + 1) / 100,000) = 3
        Assert.Equal(count, info.Rows);
        Assert.Equal((long)count, rows[0][0]);
        Assert.Equal((long)count * (count - 1) / 2, rows[0][1]); // sum 0..n-1 = n(n-1)/2
        Assert.Equal(0L, rows[0][2]); // the template's p99.9 is NaN: every row null
    }

    [Fact]
    public async Task Empty_cell_list_gives_a_readable_table_with_every_column_and_no_rows()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.With([], SyntheticRun.Epochs()), temp.Output, force: false, CancellationToken.None);

        var path = Path.Combine(temp.Output, ResultSetLayout.CellsFileName);
        var (columns, rows) = DuckDb.Query($"SELECT * FROM {DuckDb.Literal(path)}");

        Assert.Equal(ExpectedColumns, columns);
        Assert.Empty(rows);
    }

    private static object?[] Expected(CellResult c) =>
    [
        c.CellIndex, c.LatDeg, c.LonDeg, c.AreaWeight, c.Samples,
        N(c.UnavailableFraction), N(c.SatsInViewMean), N(c.PdopP50), N(c.PdopP95), N(c.HdopP95), N(c.VdopP95),
        N(c.Hpe.P50), N(c.Hpe.P95), N(c.Hpe.P99), N(c.Hpe.P999), N(c.Vpe.P50), N(c.Vpe.P95), N(c.Vpe.P99), N(c.Vpe.P999),
    ];

    private static double? N(double value) => double.IsNaN(value) ? null : value;
}

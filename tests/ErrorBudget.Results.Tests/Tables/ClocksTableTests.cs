using ErrorBudget.Core.Clocks;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Tables;

public class ClocksTableTests
{
    // The column contract of clocks.parquet, written out here on purpose (not taken from the definitions).
    private static readonly string[] ExpectedColumns =
        ["grade", "octave", "tau_s", "model_adev", "simulated_adev", "clocks", "phase_points"];

    [Fact]
    public async Task Clocks_table_reads_back_in_DuckDB_with_every_row_column_and_value()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        var path = Path.Combine(temp.Output, ResultSetLayout.ClocksFileName);
        var (columns, rows) = DuckDb.Query($"SELECT * FROM {DuckDb.Literal(path)} ORDER BY octave");

        Assert.Equal(ExpectedColumns, columns);
        var expected = SyntheticRun.Clocks();
        Assert.Equal(expected.Length, rows.Count);
        for (int i = 0; i < expected.Length; i++)
        {
            // Tolerance: exact. Parquet DOUBLE stores the IEEE 754 bits unchanged.
            Assert.Equal(Expected(expected[i]), rows[i]);
        }
    }

    [Fact]
    public async Task A_run_without_a_clock_grade_writes_an_empty_clocks_table_with_every_column()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result() with { Clocks = [] }, temp.Output, force: false, CancellationToken.None);

        var path = DuckDb.Literal(Path.Combine(temp.Output, ResultSetLayout.ClocksFileName));
        var (columns, rows) = DuckDb.Query($"SELECT * FROM {path}");

        Assert.Equal(ExpectedColumns, columns);
        Assert.Empty(rows);
    }

    private static object?[] Expected(ClockAdevRow r) =>
        [r.Grade, r.Octave, r.TauSeconds, r.ModelAdev, r.SimulatedAdev, r.Clocks, r.PhasePoints];
}

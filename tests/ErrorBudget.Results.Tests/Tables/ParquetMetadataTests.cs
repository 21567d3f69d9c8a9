using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Tables;

public class ParquetMetadataTests
{
    [Theory]
    [InlineData(ResultSetLayout.CellsFileName, "cells")]
    [InlineData(ResultSetLayout.EpochsFileName, "epochs")]
    [InlineData(ResultSetLayout.RelativityFileName, "relativity")]
    [InlineData(ResultSetLayout.ClocksFileName, "clocks")]
    [InlineData(ResultSetLayout.AgeOfDataFileName, "age_of_data")]
    public async Task Every_table_carries_the_provenance_metadata_read_by_DuckDB(string fileName, string schemaName)
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        var metadata = DuckDb.KeyValueMetadata(Path.Combine(temp.Output, fileName));

        Assert.Equal(SyntheticRun.ScenarioText, metadata["errorbudget.scenario"]); // newlines and non-ASCII survive
        Assert.Equal(SyntheticRun.Metadata().ScenarioHash, metadata["errorbudget.scenario_hash"]);
        Assert.Equal("9007199254740993", metadata["errorbudget.seed"]); // exact: 2^53 + 1
        Assert.Equal("3", metadata["errorbudget.trials"]);
        Assert.Equal("0.1.0-test+abc123", metadata["errorbudget.tool_version"]);
        Assert.Equal(schemaName, metadata["errorbudget.schema"]);
        Assert.Equal("1", metadata["errorbudget.schema_version"]);
        Assert.Equal(ResultCaution.Text, metadata["errorbudget.caution"]);
        Assert.Contains("certify nothing", metadata["errorbudget.caution"], StringComparison.Ordinal);
    }

    [Fact]
    public async Task Result_set_reader_reports_rows_columns_and_the_same_metadata_as_DuckDB()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);

        var cells = await ResultSetReader.ReadCellsInfoAsync(temp.Output);
        var epochs = await ResultSetReader.ReadEpochsInfoAsync(temp.Output);

        Assert.Equal(6, cells.Rows);
        Assert.Equal(3, epochs.Rows);
        Assert.Equal(1, cells.RowGroups);
        Assert.Equal(DuckDb.Describe(cells.Path).Select(c => c.Name), cells.Columns);
        foreach (var (key, value) in DuckDb.KeyValueMetadata(epochs.Path).Where(kv => kv.Key.StartsWith("errorbudget.", StringComparison.Ordinal)))
        {
            Assert.Equal(value, epochs.Metadata[key]);
        }

        Assert.Equal(8, cells.Metadata.Keys.Count(k => k.StartsWith("errorbudget.", StringComparison.Ordinal)));
    }
}

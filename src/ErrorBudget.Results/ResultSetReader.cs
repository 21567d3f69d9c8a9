using Parquet;

namespace ErrorBudget.Results;

/// <summary>Reads back what a short report needs from a result set's tables: row counts and metadata.</summary>
public static class ResultSetReader
{
    /// <summary>Reads the footer of one Parquet table (no column data).</summary>
    public static async Task<ParquetTableInfo> ReadTableInfoAsync(string parquetPath, CancellationToken ct = default)
    {
        await using var reader = await ParquetReader.CreateAsync(parquetPath, parquetOptions: null, ct);
        long rows = 0;
        foreach (var group in reader.RowGroups)
        {
            rows += group.RowCount;
        }

        return new ParquetTableInfo(
            parquetPath,
            rows,
            reader.RowGroupCount,
            reader.Schema.DataFields.Select(f => f.Name).ToArray(),
            new Dictionary<string, string>(reader.CustomMetadata, StringComparer.Ordinal));
    }

    /// <summary>cells.parquet of a result set folder.</summary>
    public static Task<ParquetTableInfo> ReadCellsInfoAsync(string resultDirectory, CancellationToken ct = default) =>
        ReadTableInfoAsync(Path.Combine(resultDirectory, ResultSetLayout.CellsFileName), ct);

    /// <summary>relativity.parquet of a result set folder.</summary>
    public static Task<ParquetTableInfo> ReadRelativityInfoAsync(string resultDirectory, CancellationToken ct = default) =>
        ReadTableInfoAsync(Path.Combine(resultDirectory, ResultSetLayout.RelativityFileName), ct);

    /// <summary>epochs.parquet of a result set folder.</summary>
    public static Task<ParquetTableInfo> ReadEpochsInfoAsync(string resultDirectory, CancellationToken ct = default) =>
        ReadTableInfoAsync(Path.Combine(resultDirectory, ResultSetLayout.EpochsFileName), ct);

    /// <summary>clocks.parquet of a result set folder.</summary>
    public static Task<ParquetTableInfo> ReadClocksInfoAsync(string resultDirectory, CancellationToken ct = default) =>
        ReadTableInfoAsync(Path.Combine(resultDirectory, ResultSetLayout.ClocksFileName), ct);

    /// <summary>age_of_data.parquet of a result set folder.</summary>
    public static Task<ParquetTableInfo> ReadAgeOfDataInfoAsync(string resultDirectory, CancellationToken ct = default) =>
        ReadTableInfoAsync(Path.Combine(resultDirectory, ResultSetLayout.AgeOfDataFileName), ct);
}

using Parquet;

namespace ErrorBudget.Results.Tables;

/// <summary>Writes one result table to a Parquet file from its <see cref="TableDefinition{TRow}"/>.</summary>
internal static class ParquetTableWriter
{
    /// <param name="table">Columns and schema.</param>
    /// <param name="rows">The rows, in file order.</param>
    /// <param name="path">File to create (must not exist).</param>
    /// <param name="metadata">Key-value metadata for the footer.</param>
    /// <param name="rowsPerGroup">Rows per row group. Range: >= 1.</param>
    /// <param name="ct">Checked before every column chunk.</param>
    public static async Task WriteAsync<TRow>(
        TableDefinition<TRow> table,
        IReadOnlyList<TRow> rows,
        string path,
        IReadOnlyDictionary<string, string> metadata,
        int rowsPerGroup,
        CancellationToken ct)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(rowsPerGroup, 1);
        var options = new ParquetOptions { CompressionMethod = CompressionMethod.Snappy };

        await using var stream = new FileStream(path, FileMode.CreateNew, FileAccess.ReadWrite, FileShare.None);

        // The footer (schema, row groups, metadata) is written when the writer is disposed.
        await using (var writer = await ParquetWriter.CreateAsync(table.Schema, stream, options, append: false, ct))
        {
            writer.CustomMetadata = metadata;

            // An empty table still gets one (empty) row group so readers see every column.
            for (int start = 0; start < Math.Max(rows.Count, 1); start += rowsPerGroup)
            {
                int count = Math.Min(rowsPerGroup, rows.Count - start);

                // Every row-group writer must be disposed or its rows are silently lost (REFERENCE.md).
                using var rowGroup = writer.CreateRowGroup();
                foreach (var column in table.Columns)
                {
                    ct.ThrowIfCancellationRequested();
                    await column.WriteAsync(rowGroup, rows, start, count, ct);
                }

                // A column left out would silently corrupt the file: make the library check.
                rowGroup.CompleteValidate();
            }
        }

        await stream.FlushAsync(ct);
        stream.Flush(flushToDisk: true);
    }
}

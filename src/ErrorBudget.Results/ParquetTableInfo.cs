namespace ErrorBudget.Results;

/// <summary>What <see cref="ResultSetReader"/> reports about one Parquet table.</summary>
/// <param name="Path">The file read.</param>
/// <param name="Rows">Total rows over all row groups.</param>
/// <param name="RowGroups">Number of row groups.</param>
/// <param name="Columns">Column names in file order.</param>
/// <param name="Metadata">Key-value metadata of the footer (see <see cref="MetadataKeys"/>).</param>
public sealed record ParquetTableInfo(
    string Path,
    long Rows,
    int RowGroups,
    IReadOnlyList<string> Columns,
    IReadOnlyDictionary<string, string> Metadata);

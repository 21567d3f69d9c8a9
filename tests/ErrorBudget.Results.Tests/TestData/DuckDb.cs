using DuckDB.NET.Data;

namespace ErrorBudget.Results.Tests.TestData;

/// <summary>An independent reader of the written files: DuckDB in memory.</summary>
internal static class DuckDb
{
    /// <summary>A SQL string literal for a path.</summary>
    public static string Literal(string path) => "'" + path.Replace("'", "''", StringComparison.Ordinal) + "'";

    /// <summary>Runs a query; returns the column names and every row (DBNull as null).</summary>
    public static (string[] Columns, List<object?[]> Rows) Query(string sql)
    {
        using var connection = new DuckDBConnection("DataSource=:memory:");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        var columns = Enumerable.Range(0, reader.FieldCount).Select(reader.GetName).ToArray();
        var rows = new List<object?[]>();
        while (reader.Read())
        {
            var row = new object?[reader.FieldCount];
            for (int i = 0; i < row.Length; i++)
            {
                row[i] = reader.IsDBNull(i) ? null : reader.GetValue(i);
            }

            rows.Add(row);
        }

        return (columns, rows);
    }

    /// <summary>DESCRIBE of a Parquet file: (column name, DuckDB type) in file order.</summary>
    public static List<(string Name, string Type)> Describe(string parquetPath)
    {
        var (columns, rows) = Query($"DESCRIBE SELECT * FROM {Literal(parquetPath)}");
        int name = Array.IndexOf(columns, "column_name");
        int type = Array.IndexOf(columns, "column_type");
        return rows.Select(r => ((string)r[name]!, (string)r[type]!)).ToList();
    }

    /// <summary>Key-value metadata of a Parquet file through parquet_kv_metadata (BLOBs decoded).</summary>
    public static Dictionary<string, string> KeyValueMetadata(string parquetPath)
    {
        var (_, rows) = Query($"SELECT decode(key), decode(value) FROM parquet_kv_metadata({Literal(parquetPath)})");
        return rows.ToDictionary(r => (string)r[0]!, r => (string)r[1]!, StringComparer.Ordinal);
    }
}

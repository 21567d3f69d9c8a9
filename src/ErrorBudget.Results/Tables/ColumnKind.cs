namespace ErrorBudget.Results.Tables;

/// <summary>Physical type of a result table column (Parquet type; Table Schema type).</summary>
internal enum ColumnKind
{
    /// <summary>Parquet INT32; Table Schema "integer".</summary>
    Int32,

    /// <summary>Parquet INT64; Table Schema "integer".</summary>
    Int64,

    /// <summary>Parquet DOUBLE; Table Schema "number".</summary>
    Double,

    /// <summary>Parquet BYTE_ARRAY with the UTF-8 string annotation; Table Schema "string".</summary>
    String,
}

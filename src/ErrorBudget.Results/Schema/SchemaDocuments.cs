using ErrorBudget.Results.Summary;
using ErrorBudget.Results.Tables;

namespace ErrorBudget.Results.Schema;

/// <summary>
/// The documents of results-schema/, generated from the table and summary definitions. The
/// checked-in files must equal these texts (a test holds them together).
/// </summary>
internal static class SchemaDocuments
{
    /// <summary>File name of a schema document: "&lt;name&gt;.schema.json".</summary>
    public static string FileName(string name) => $"{name}.schema.json";

    /// <summary>Every document as (file name, text), in a fixed order.</summary>
    public static IReadOnlyList<(string FileName, string Text)> All() =>
    [
        (FileName(CellsTable.Definition.Name), TableSchemaDocument.Build(CellsTable.Definition)),
        (FileName(EpochsTable.Definition.Name), TableSchemaDocument.Build(EpochsTable.Definition)),
        (FileName(RelativityTable.Definition.Name), TableSchemaDocument.Build(RelativityTable.Definition)),
        (FileName(ClocksTable.Definition.Name), TableSchemaDocument.Build(ClocksTable.Definition)),
        (FileName(AgeOfDataTable.Definition.Name), TableSchemaDocument.Build(AgeOfDataTable.Definition)),
        (FileName(AvailabilityTable.Definition.Name), TableSchemaDocument.Build(AvailabilityTable.Definition)),
        (FileName(IntegrityTable.Definition.Name), TableSchemaDocument.Build(IntegrityTable.Definition)),
        (FileName(OverboundTable.Definition.Name), TableSchemaDocument.Build(OverboundTable.Definition)),
        (FileName(SummaryDefinition.Name), SummarySchemaDocument.Build()),
    ];

    /// <summary>Table Schema types: "integer", "number", "string".</summary>
    public static string TableSchemaType(ColumnKind kind) => kind switch
    {
        ColumnKind.Int32 or ColumnKind.Int64 => "integer",
        ColumnKind.Double => "number",
        ColumnKind.String => "string",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };

    /// <summary>Parquet physical type (custom property "parquetType").</summary>
    public static string ParquetType(ColumnKind kind) => kind switch
    {
        ColumnKind.Int32 => "INT32",
        ColumnKind.Int64 => "INT64",
        ColumnKind.Double => "DOUBLE",
        ColumnKind.String => "BYTE_ARRAY (UTF8)",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };
}

using System.Text;
using System.Text.Json;
using ErrorBudget.Results.Summary;
using ErrorBudget.Results.Tables;

namespace ErrorBudget.Results.Schema;

/// <summary>
/// A Frictionless Table Schema (v2) document for one Parquet table. Custom properties: "unit" (unit
/// symbol, "1" for dimensionless), "parquetType" (physical type), top-level "file" and "schemaVersion".
/// </summary>
internal static class TableSchemaDocument
{
    public const string ProfileUri = "https://datapackage.org/profiles/2.0/tableschema.json";

    public static string Build<TRow>(TableDefinition<TRow> table)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, SummaryJsonWriter.JsonDocumentOptions()))
        {
            json.WriteStartObject();
            json.WriteString("$schema", ProfileUri);
            json.WriteString("name", table.Name);
            json.WriteString("title", table.Title);
            json.WriteString("description", table.Description);
            json.WriteString("file", table.FileName);
            json.WriteNumber("schemaVersion", ResultSetLayout.SchemaVersion);
            json.WriteStartArray("fields");
            foreach (var column in table.Columns)
            {
                WriteField(json, column);
            }

            json.WriteEndArray();
            // A composite key is written "a,b" in the definition.
            json.WriteStartArray("primaryKey");
            foreach (string key in table.PrimaryKey.Split(','))
            {
                json.WriteStringValue(key);
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
    }

    private static void WriteField<TRow>(Utf8JsonWriter json, ColumnDefinition<TRow> column)
    {
        json.WriteStartObject();
        json.WriteString("name", column.Name);
        json.WriteString("type", SchemaDocuments.TableSchemaType(column.Kind));
        json.WriteString("description", column.Description);
        if (column.Unit is not null)
        {
            json.WriteString("unit", column.Unit);
        }

        json.WriteString("parquetType", SchemaDocuments.ParquetType(column.Kind));
        json.WriteStartObject("constraints");
        json.WriteBoolean("required", !column.Nullable);
        WriteBound(json, "minimum", column.Minimum, column.Kind);
        WriteBound(json, "maximum", column.Maximum, column.Kind);
        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteBound(Utf8JsonWriter json, string name, double? bound, ColumnKind kind)
    {
        if (bound is not { } value)
        {
            return;
        }

        if (kind is ColumnKind.Int32 or ColumnKind.Int64)
        {
            json.WriteNumber(name, checked((long)value));
        }
        else
        {
            json.WriteNumber(name, value);
        }
    }
}

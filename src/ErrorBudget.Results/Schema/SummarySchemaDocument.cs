using System.Text;
using System.Text.Json;
using ErrorBudget.Results.Summary;

namespace ErrorBudget.Results.Schema;

/// <summary>
/// The JSON Schema (draft 2020-12) document of summary.json. Custom annotation: "unit" (unit symbol,
/// "1" for counts and fractions); unknown keywords are annotations in draft 2020-12.
/// </summary>
internal static class SummarySchemaDocument
{
    public const string MetaSchemaUri = "https://json-schema.org/draft/2020-12/schema";

    public static string Build()
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, SummaryJsonWriter.JsonDocumentOptions()))
        {
            json.WriteStartObject();
            json.WriteString("$schema", MetaSchemaUri);
            json.WriteString("title", SummaryDefinition.Title);
            json.WriteString("description", SummaryDefinition.Description);
            json.WriteString("file", ResultSetLayout.SummaryFileName);
            json.WriteNumber("schemaVersion", ResultSetLayout.SchemaVersion);
            WriteObjectBody(json, SummaryDefinition.Fields);
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
    }

    private static void WriteObjectBody(Utf8JsonWriter json, IReadOnlyList<SummaryField> fields)
    {
        json.WriteString("type", "object");
        json.WriteStartObject("properties");
        foreach (var field in fields)
        {
            json.WriteStartObject(field.Name);
            json.WriteString("description", field.Description);
            WriteFieldBody(json, field);
            json.WriteEndObject();
        }

        json.WriteEndObject();
        json.WriteStartArray("required");
        foreach (var field in fields)
        {
            json.WriteStringValue(field.Name);
        }

        json.WriteEndArray();
        json.WriteBoolean("additionalProperties", false);
    }

    private static void WriteFieldBody(Utf8JsonWriter json, SummaryField field)
    {
        switch (field)
        {
            case SummaryInteger i:
                json.WriteString("type", "integer");
                json.WriteString("unit", i.Unit);
                if (i.Minimum is { } min)
                {
                    json.WriteNumber("minimum", min);
                }

                break;
            case SummaryUnsignedInteger u:
                json.WriteString("type", "integer");
                json.WriteString("unit", u.Unit);
                json.WriteNumber("minimum", 0);
                break;
            case SummaryNumber n:
                if (n.Nullable)
                {
                    json.WriteStartArray("type");
                    json.WriteStringValue("number");
                    json.WriteStringValue("null");
                    json.WriteEndArray();
                }
                else
                {
                    json.WriteString("type", "number");
                }

                json.WriteString("unit", n.Unit);
                if (n.Minimum is { } nmin)
                {
                    json.WriteNumber("minimum", nmin);
                }

                if (n.Maximum is { } nmax)
                {
                    json.WriteNumber("maximum", nmax);
                }

                break;
            case SummaryString s:
                json.WriteString("type", "string");
                if (s.Format is not null)
                {
                    json.WriteString("format", s.Format);
                }

                break;
            case SummaryObject o:
                WriteObjectBody(json, o.Fields);
                break;
            default:
                throw new InvalidOperationException($"Unknown summary field kind {field.GetType().Name}.");
        }
    }
}

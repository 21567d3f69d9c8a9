using System.Text.Encodings.Web;
using System.Text.Json;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Summary;

/// <summary>Writes summary.json from <see cref="SummaryDefinition.Fields"/>. Utf8JsonWriter is culture-free: '.' decimals always.</summary>
internal static class SummaryJsonWriter
{
    public static void Write(RunResult result, Stream output)
    {
        using (var json = new Utf8JsonWriter(output, JsonDocumentOptions()))
        {
            WriteObject(json, SummaryDefinition.Fields, result);
        }

        output.Write("\n"u8); // a text file ends with a line end
    }

    /// <summary>
    /// Indented, '\n' line ends on every OS (files compare byte for byte), and no HTML-safety escaping:
    /// these are data files, so "+", "'" and non-ASCII text stay readable.
    /// </summary>
    internal static JsonWriterOptions JsonDocumentOptions() => new()
    {
        Indented = true,
        NewLine = "\n",
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    private static void WriteObject(Utf8JsonWriter json, IReadOnlyList<SummaryField> fields, RunResult result)
    {
        json.WriteStartObject();
        foreach (var field in fields)
        {
            json.WritePropertyName(field.Name);
            switch (field)
            {
                case SummaryInteger i:
                    json.WriteNumberValue(i.Get(result));
                    break;
                case SummaryUnsignedInteger u:
                    json.WriteNumberValue(u.Get(result));
                    break;
                case SummaryNumber n:
                    WriteNumber(json, n, n.Get(result));
                    break;
                case SummaryString s:
                    json.WriteStringValue(s.Get(result));
                    break;
                case SummaryObject o:
                    WriteObject(json, o.Fields, result);
                    break;
                default:
                    throw new InvalidOperationException($"Unknown summary field kind {field.GetType().Name}.");
            }
        }

        json.WriteEndObject();
    }

    private static void WriteNumber(Utf8JsonWriter json, SummaryNumber field, double value)
    {
        if (double.IsFinite(value))
        {
            json.WriteNumberValue(value);
        }
        else if (field.Nullable && double.IsNaN(value))
        {
            json.WriteNullValue();
        }
        else
        {
            throw new InvalidOperationException($"Summary member '{field.Name}' is {value}; JSON has no such number.");
        }
    }
}

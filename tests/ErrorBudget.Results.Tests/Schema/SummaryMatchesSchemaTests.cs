using System.Text.Json;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Schema;

/// <summary>
/// summary.json against results-schema/summary.schema.json: the subset of JSON Schema the document
/// uses (type, properties, required, additionalProperties, minimum, maximum), checked by hand.
/// </summary>
public class SummaryMatchesSchemaTests
{
    [Fact]
    public async Task Written_summary_satisfies_its_json_schema()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);
        using var schema = SchemaFiles.Load("summary");
        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(temp.Output, ResultSetLayout.SummaryFileName)));

        Assert.Equal("https://json-schema.org/draft/2020-12/schema", schema.RootElement.GetProperty("$schema").GetString());
        Assert.Contains("2020-12", schema.RootElement.GetProperty("description").GetString(), StringComparison.Ordinal);
        var problems = new List<string>();
        Check(schema.RootElement, summary.RootElement, "$", problems);

        Assert.Empty(problems);
    }

    [Fact]
    public async Task Summary_members_come_in_the_schema_order()
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);
        using var schema = SchemaFiles.Load("summary");
        using var summary = JsonDocument.Parse(File.ReadAllText(Path.Combine(temp.Output, ResultSetLayout.SummaryFileName)));

        Assert.Equal(
            schema.RootElement.GetProperty("properties").EnumerateObject().Select(p => p.Name),
            summary.RootElement.EnumerateObject().Select(p => p.Name));
    }

    private static void Check(JsonElement schema, JsonElement value, string path, List<string> problems)
    {
        if (!TypeMatches(schema.GetProperty("type"), value))
        {
            problems.Add($"{path}: {value.ValueKind} is not {schema.GetProperty("type").GetRawText()}");
            return;
        }

        if (value.ValueKind == JsonValueKind.Number)
        {
            if (schema.TryGetProperty("minimum", out var min) && value.GetDecimal() < min.GetDecimal())
            {
                problems.Add($"{path}: {value} < {min}");
            }

            if (schema.TryGetProperty("maximum", out var max) && value.GetDecimal() > max.GetDecimal())
            {
                problems.Add($"{path}: {value} > {max}");
            }
        }

        if (value.ValueKind != JsonValueKind.Object)
        {
            return;
        }

        var properties = schema.GetProperty("properties");
        foreach (var required in schema.GetProperty("required").EnumerateArray())
        {
            if (!value.TryGetProperty(required.GetString()!, out _))
            {
                problems.Add($"{path}: missing {required}");
            }
        }

        foreach (var member in value.EnumerateObject())
        {
            if (properties.TryGetProperty(member.Name, out var memberSchema))
            {
                Check(memberSchema, member.Value, $"{path}.{member.Name}", problems);
            }
            else if (!schema.GetProperty("additionalProperties").GetBoolean())
            {
                problems.Add($"{path}: unexpected member {member.Name}");
            }
        }
    }

    private static bool TypeMatches(JsonElement type, JsonElement value) =>
        type.ValueKind == JsonValueKind.Array
            ? type.EnumerateArray().Any(t => TypeMatches(t, value))
            : type.GetString() switch
            {
                "object" => value.ValueKind == JsonValueKind.Object,
                "string" => value.ValueKind == JsonValueKind.String,
                "number" => value.ValueKind == JsonValueKind.Number,
                "integer" => value.ValueKind == JsonValueKind.Number && value.GetDecimal() == decimal.Truncate(value.GetDecimal()),
                "null" => value.ValueKind == JsonValueKind.Null,
                _ => false,
            };
}

using System.Text.Json;
using ErrorBudget.Results.Tests.TestData;

namespace ErrorBudget.Results.Tests.Schema;

/// <summary>The files as written, read by DuckDB, against the checked-in documents of results-schema/.</summary>
public class WrittenTablesMatchSchemaTests
{
    [Theory]
    [InlineData("cells")]
    [InlineData("epochs")]
    [InlineData("relativity")]
    [InlineData("clocks")]
    [InlineData("age_of_data")]
    public async Task Written_table_has_the_fields_order_and_types_of_its_table_schema(string name)
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);
        using var schema = SchemaFiles.Load(name);
        string file = schema.RootElement.GetProperty("file").GetString()!;

        var described = DuckDb.Describe(Path.Combine(temp.Output, file));
        var fields = schema.RootElement.GetProperty("fields").EnumerateArray().ToList();

        Assert.Equal(fields.Select(f => f.GetProperty("name").GetString()), described.Select(d => d.Name));
        for (int i = 0; i < fields.Count; i++)
        {
            string type = fields[i].GetProperty("type").GetString()!;
            string parquetType = fields[i].GetProperty("parquetType").GetString()!;
            Assert.Equal(ExpectedDuckDbType(type, parquetType), described[i].Type);
        }
    }

    [Theory]
    [InlineData("cells")]
    [InlineData("epochs")]
    [InlineData("relativity")]
    [InlineData("clocks")]
    [InlineData("age_of_data")]
    public void Table_schema_fields_carry_a_description_and_numeric_fields_a_unit(string name)
    {
        using var schema = SchemaFiles.Load(name);

        Assert.Equal("https://datapackage.org/profiles/2.0/tableschema.json", schema.RootElement.GetProperty("$schema").GetString());
        foreach (var field in schema.RootElement.GetProperty("fields").EnumerateArray())
        {
            Assert.False(string.IsNullOrWhiteSpace(field.GetProperty("description").GetString()));
            if (field.GetProperty("type").GetString() is "integer" or "number")
            {
                Assert.False(string.IsNullOrWhiteSpace(field.GetProperty("unit").GetString()));
            }
        }
    }

    [Theory]
    [InlineData("cells")]
    [InlineData("epochs")]
    [InlineData("relativity")]
    [InlineData("clocks")]
    [InlineData("age_of_data")]
    public async Task Written_values_respect_the_schema_constraints(string name)
    {
        using var temp = new TempFolder();
        await ResultSetWriter.WriteAsync(SyntheticRun.Result(), temp.Output, force: false, CancellationToken.None);
        using var schema = SchemaFiles.Load(name);
        string path = DuckDb.Literal(Path.Combine(temp.Output, schema.RootElement.GetProperty("file").GetString()!));

        foreach (var field in schema.RootElement.GetProperty("fields").EnumerateArray())
        {
            string column = field.GetProperty("name").GetString()!;
            var constraints = field.GetProperty("constraints");
            var checks = new List<string>();
            if (constraints.GetProperty("required").GetBoolean())
            {
                checks.Add($"{column} IS NULL");
            }

            if (constraints.TryGetProperty("minimum", out var min))
            {
                checks.Add($"{column} < {min.GetRawText()}");
            }

            if (constraints.TryGetProperty("maximum", out var max))
            {
                checks.Add($"{column} > {max.GetRawText()}");
            }

            if (checks.Count == 0)
            {
                continue;
            }

            var (_, rows) = DuckDb.Query($"SELECT count(*) FROM {path} WHERE {string.Join(" OR ", checks)}");
            Assert.True((long)rows[0][0]! == 0, $"{name}.{column} breaks a constraint: {string.Join(" OR ", checks)}");
        }
    }

    /// <summary>integer &lt;-&gt; INT32/INT64 (DuckDB INTEGER/BIGINT), number &lt;-&gt; DOUBLE, string &lt;-&gt; VARCHAR.</summary>
    private static string ExpectedDuckDbType(string tableSchemaType, string parquetType) => (tableSchemaType, parquetType) switch
    {
        ("integer", "INT32") => "INTEGER",
        ("integer", "INT64") => "BIGINT",
        ("number", "DOUBLE") => "DOUBLE",
        ("string", "BYTE_ARRAY (UTF8)") => "VARCHAR",
        _ => throw new InvalidOperationException($"Schema pairs type {tableSchemaType} with {parquetType}."),
    };
}

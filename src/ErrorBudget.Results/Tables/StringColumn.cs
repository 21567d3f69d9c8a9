using Parquet;
using Parquet.Schema;

namespace ErrorBudget.Results.Tables;

/// <summary>A non-nullable UTF-8 string column.</summary>
internal sealed class StringColumn<TRow>(string name, string? unit, string description, Func<TRow, string> get)
    : ColumnDefinition<TRow>(name, ColumnKind.String, nullable: false, unit, description, minimum: null, maximum: null)
{
    private readonly DataField<string> _field = new(name, nullable: false);

    public override DataField Field => _field;

    public override Task WriteAsync(ParquetRowGroupWriter rowGroup, IReadOnlyList<TRow> rows, int start, int count, CancellationToken ct)
    {
        var values = new string[count];
        for (int i = 0; i < count; i++)
        {
            // A null here would silently corrupt a non-nullable column (REFERENCE.md): refuse it.
            values[i] = get(rows[start + i]) ?? throw new InvalidOperationException($"Column '{Name}' got a null string at row {start + i}.");
        }

        return rowGroup.WriteAsync(_field, values);
    }
}

using Parquet;
using Parquet.Schema;

namespace ErrorBudget.Results.Tables;

/// <summary>A non-nullable 32-bit integer column.</summary>
internal sealed class Int32Column<TRow>(string name, string unit, string description, Func<TRow, int> get, double? minimum = null)
    : ColumnDefinition<TRow>(name, ColumnKind.Int32, nullable: false, unit, description, minimum, maximum: null)
{
    private readonly DataField<int> _field = new(name, nullable: false);

    public override DataField Field => _field;

    public override Task WriteAsync(ParquetRowGroupWriter rowGroup, IReadOnlyList<TRow> rows, int start, int count, CancellationToken ct)
    {
        var values = new int[count];
        for (int i = 0; i < count; i++)
        {
            values[i] = get(rows[start + i]);
        }

        return rowGroup.WriteAsync<int>(_field, values, cancellationToken: ct);
    }
}

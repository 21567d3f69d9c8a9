using Parquet;
using Parquet.Schema;

namespace ErrorBudget.Results.Tables;

/// <summary>A non-nullable 64-bit integer column.</summary>
internal sealed class Int64Column<TRow>(string name, string unit, string description, Func<TRow, long> get, double? minimum = null)
    : ColumnDefinition<TRow>(name, ColumnKind.Int64, nullable: false, unit, description, minimum, maximum: null)
{
    private readonly DataField<long> _field = new(name, nullable: false);

    public override DataField Field => _field;

    public override Task WriteAsync(ParquetRowGroupWriter rowGroup, IReadOnlyList<TRow> rows, int start, int count, CancellationToken ct)
    {
        var values = new long[count];
        for (int i = 0; i < count; i++)
        {
            values[i] = get(rows[start + i]);
        }

        return rowGroup.WriteAsync<long>(_field, values, cancellationToken: ct);
    }
}

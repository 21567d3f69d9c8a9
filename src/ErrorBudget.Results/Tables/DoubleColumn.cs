using Parquet;
using Parquet.Schema;

namespace ErrorBudget.Results.Tables;

/// <summary>
/// A double column. Nullable columns write NaN (a figure the samples cannot support) as null;
/// non-nullable columns are written from a plain double array, so no null can reach them.
/// </summary>
internal sealed class DoubleColumn<TRow> : ColumnDefinition<TRow>
{
    private readonly Func<TRow, double> _get;
    private readonly DataField _field;

    public DoubleColumn(string name, bool nullable, string unit, string description, Func<TRow, double> get, double? minimum = null, double? maximum = null)
        : base(name, ColumnKind.Double, nullable, unit, description, minimum, maximum)
    {
        _get = get;
        _field = nullable ? new DataField<double?>(name, nullable: true) : new DataField<double>(name, nullable: false);
    }

    public override DataField Field => _field;

    public override Task WriteAsync(ParquetRowGroupWriter rowGroup, IReadOnlyList<TRow> rows, int start, int count, CancellationToken ct)
    {
        if (Nullable)
        {
            var values = new double?[count];
            for (int i = 0; i < count; i++)
            {
                double v = _get(rows[start + i]);
                values[i] = double.IsNaN(v) ? null : v;
            }

            return rowGroup.WriteAsync<double>(_field, new ReadOnlyMemory<double?>(values), cancellationToken: ct);
        }

        var plain = new double[count];
        for (int i = 0; i < count; i++)
        {
            plain[i] = _get(rows[start + i]);
        }

        return rowGroup.WriteAsync<double>(_field, new ReadOnlyMemory<double>(plain), cancellationToken: ct);
    }
}

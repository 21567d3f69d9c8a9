using Parquet;
using Parquet.Schema;

namespace ErrorBudget.Results.Tables;

/// <summary>
/// One column of a result table: name, type, unit, meaning and how to get the value from a row.
/// The Parquet field, the writer and the schema document are all derived from this one object.
/// </summary>
/// <typeparam name="TRow">The row record (e.g. CellResult).</typeparam>
internal abstract class ColumnDefinition<TRow>
{
    protected ColumnDefinition(string name, ColumnKind kind, bool nullable, string? unit, string description, double? minimum, double? maximum)
    {
        Name = name;
        Kind = kind;
        Nullable = nullable;
        Unit = unit;
        Description = description;
        Minimum = minimum;
        Maximum = maximum;
    }

    /// <summary>Column name, snake_case with a unit suffix where the unit is not obvious.</summary>
    public string Name { get; }

    public ColumnKind Kind { get; }

    /// <summary>True when the column may hold nulls (a NaN figure is written as null).</summary>
    public bool Nullable { get; }

    /// <summary>Unit symbol ("m", "deg", "s", "1" for dimensionless), or null where no unit applies.</summary>
    public string? Unit { get; }

    /// <summary>What the value means, one or two sentences.</summary>
    public string Description { get; }

    /// <summary>Smallest valid value, if there is an obvious one.</summary>
    public double? Minimum { get; }

    /// <summary>Largest valid value, if there is an obvious one.</summary>
    public double? Maximum { get; }

    /// <summary>The Parquet field (built once; the schema and the row-group writes share the same instance).</summary>
    public abstract DataField Field { get; }

    /// <summary>Writes rows [start, start + count) of this column into the row group.</summary>
    public abstract Task WriteAsync(ParquetRowGroupWriter rowGroup, IReadOnlyList<TRow> rows, int start, int count, CancellationToken ct);
}

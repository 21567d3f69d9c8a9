using Parquet.Schema;

namespace ErrorBudget.Results.Tables;

/// <summary>A result table: its schema document name, file, meaning, key and ordered columns.</summary>
/// <typeparam name="TRow">The row record.</typeparam>
internal sealed class TableDefinition<TRow>
{
    public TableDefinition(string name, string fileName, string title, string description, string primaryKey, IReadOnlyList<ColumnDefinition<TRow>> columns)
    {
        Name = name;
        FileName = fileName;
        Title = title;
        Description = description;
        PrimaryKey = primaryKey;
        Columns = columns;
        Schema = new ParquetSchema(columns.Select(c => (Field)c.Field));
    }

    /// <summary>Schema document name ("cells": results-schema/cells.schema.json, metadata errorbudget.schema).</summary>
    public string Name { get; }

    /// <summary>File name inside a result set folder.</summary>
    public string FileName { get; }

    public string Title { get; }

    public string Description { get; }

    /// <summary>Column whose values are unique per row.</summary>
    public string PrimaryKey { get; }

    /// <summary>The columns in file order.</summary>
    public IReadOnlyList<ColumnDefinition<TRow>> Columns { get; }

    /// <summary>The Parquet schema, built from <see cref="Columns"/>.</summary>
    public ParquetSchema Schema { get; }
}

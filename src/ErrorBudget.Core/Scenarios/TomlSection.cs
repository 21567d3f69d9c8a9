namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// One table of a scenario file: a <c>[name]</c> table (all its headers merged) or one element of a
/// <c>[[name]]</c> array.
/// </summary>
internal sealed class TomlSection(string name, bool writtenAsArray, int index, int line)
{
    /// <summary>Table name as written in the header.</summary>
    public string Name { get; } = name;

    /// <summary>True when the header was <c>[[name]]</c>.</summary>
    public bool WrittenAsArray { get; } = writtenAsArray;

    /// <summary>1-based position among the <c>[[name]]</c> headers of the same name; 0 for a plain table.</summary>
    public int Index { get; } = index;

    /// <summary>1-based line of the (first) header.</summary>
    public int Line { get; } = line;

    public List<TomlEntry> Entries { get; } = [];

    /// <summary>The prefix of this table's dotted keys: <c>grid</c>, or <c>shell[2]</c> for array elements.</summary>
    public string Path => Index > 0 ? $"{Name}[{Index}]" : Name;

    /// <summary>How the header appears in the file.</summary>
    public string Written => WrittenAsArray ? $"[[{Name}]]" : $"[{Name}]";
}

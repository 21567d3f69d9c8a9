using System.Text;
using Tomlyn.Syntax;

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// A scenario file's syntax tree flattened into tables of entries with 1-based lines, because
/// messages must name the line of every key (the untyped model keeps no positions). Duplicate keys
/// and tables are found here, worded our way: Tomlyn's validator reports them too, but the
/// untyped model would silently keep one of them.
/// </summary>
internal sealed class TomlDocument
{
    private const int MaxValueTextLength = 40;

    private readonly Dictionary<int, string> _keyByLine = [];

    private TomlDocument()
    {
    }

    /// <summary>Key-values written before the first table header.</summary>
    public List<TomlEntry> RootEntries { get; } = [];

    /// <summary>Tables in file order; a repeated plain table is merged into its first header.</summary>
    public List<TomlSection> Sections { get; } = [];

    /// <summary>1-based lines of every table header, in file order.</summary>
    public List<int> HeaderLines { get; } = [];

    /// <summary>The header line of the table a 1-based line belongs to; 0 before the first header.</summary>
    public int HeaderOf(int line) => HeaderLines.LastOrDefault(h => h <= line);

    /// <summary>The dotted key written on a 1-based line, or empty.</summary>
    public string KeyAt(int line) => _keyByLine.GetValueOrDefault(line, "");

    public static TomlDocument Read(DocumentSyntax document, string text, ScenarioErrorList errors)
    {
        var result = new TomlDocument();
        foreach (var kv in document.KeyValues)
        {
            result.RootEntries.Add(Entry(kv, text));
        }

        var plain = new Dictionary<string, TomlSection>(StringComparer.Ordinal);
        var arrayCounts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var table in document.Tables)
        {
            var name = KeyText(table.Name);
            var line = table.Span.Start.Line + 1;
            var isArray = table is TableArraySyntax;
            result.HeaderLines.Add(line);
            TomlSection section;
            if (isArray)
            {
                var index = arrayCounts.GetValueOrDefault(name) + 1;
                arrayCounts[name] = index;
                section = new TomlSection(name, writtenAsArray: true, index, line);
                result.Sections.Add(section);
            }
            else if (plain.TryGetValue(name, out var first))
            {
                errors.Table(line, name, $"[{name}]", $"is defined twice (first at line {first.Line})",
                    "each table once; only [[shell]] repeats");
                section = first;
            }
            else
            {
                section = new TomlSection(name, writtenAsArray: false, index: 0, line);
                plain[name] = section;
                result.Sections.Add(section);
            }

            result.AddEntries(section, table.Items, text, errors);
        }

        return result;
    }

    private void AddEntries(TomlSection section, IEnumerable<KeyValueSyntax> items, string text, ScenarioErrorList errors)
    {
        foreach (var kv in items)
        {
            var entry = Entry(kv, text);
            var path = $"{section.Path}.{entry.Key}";
            _keyByLine.TryAdd(entry.Line, path);
            var first = section.Entries.Find(e => e.Key == entry.Key);
            if (first is not null)
            {
                errors.Key(entry.Line, path, entry.ValueText, $"is defined twice (first at line {first.Line})",
                    "each key once per table");
                continue;
            }

            section.Entries.Add(entry);
        }
    }

    private static TomlEntry Entry(KeyValueSyntax kv, string text)
    {
        var line = (kv.Key?.Span.Start.Line ?? kv.Span.Start.Line) + 1;
        return new TomlEntry(KeyText(kv.Key), kv.Value, line, ValueText(kv.Value, text));
    }

    /// <summary>The key's parts joined with '.', quoted parts unquoted.</summary>
    internal static string KeyText(KeySyntax? key)
    {
        if (key is null)
        {
            return "";
        }

        var builder = new StringBuilder(Part(key.Key));
        foreach (var dotted in key.DotKeys)
        {
            builder.Append('.').Append(Part(dotted.Key));
        }

        return builder.ToString();
    }

    private static string Part(BareKeyOrStringValueSyntax? part) => part switch
    {
        BareKeySyntax bare => bare.Key?.Text ?? "",
        StringValueSyntax quoted => quoted.Value ?? "",
        _ => "",
    };

    /// <summary>The value exactly as written (node spans exclude trivia), on one line, shortened.</summary>
    private static string ValueText(ValueSyntax? value, string text)
    {
        if (value is null)
        {
            return "";
        }

        var span = value.Span;
        var raw = span.Offset >= 0 && span.Length > 0 && span.Offset + span.Length <= text.Length
            ? text.Substring(span.Offset, span.Length)
            : value.ToString() ?? "";
        var oneLine = string.Join(' ', raw.Split((char[])['\r', '\n', '\t', ' '], StringSplitOptions.RemoveEmptyEntries));
        return oneLine.Length <= MaxValueTextLength ? oneLine : oneLine[..(MaxValueTextLength - 3)] + "...";
    }
}

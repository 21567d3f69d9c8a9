using Tomlyn.Syntax;

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// Checks one table against its <see cref="TableSpec"/>: unknown keys, missing required keys,
/// value kinds and static ranges. Each key is checked on its own; every problem is reported.
/// </summary>
internal static class SectionReader
{
    /// <summary>Reads <paramref name="section"/> (null: the table was left out, so only defaults apply).</summary>
    public static SectionValues Read(TomlSection? section, TableSpec spec, string path, ScenarioErrorList errors)
    {
        var values = new SectionValues(path, section?.Line ?? 0);
        var entries = section?.Entries ?? [];
        foreach (var entry in entries.Where(e => spec.Find(e.Key) is null))
        {
            errors.Key(entry.Line, $"{path}.{entry.Key}", entry.ValueText, $"is not a known key of {spec.Written}", spec.KeyList);
        }

        foreach (var key in spec.Keys)
        {
            var entry = entries.Find(e => e.Key == key.Name);
            if (entry is not null)
            {
                ReadValue(entry, key, values, errors);
            }
            else if (key.Default is { } fallback)
            {
                values.Set(key.Name, Normalise(key, fallback), values.TableLine, DefaultText(fallback));
            }
            else if (key.IsRequired && section is not null)
            {
                errors.Key(section.Line, values.KeyPath(key.Name), "", "is missing", key.Allowed);
            }
        }

        return values;
    }

    private static void ReadValue(TomlEntry entry, KeySpec key, SectionValues values, ScenarioErrorList errors)
    {
        var path = values.KeyPath(key.Name);
        var (value, problem) = Convert(entry.Value, key);
        if (problem is null && value is double number)
        {
            problem = key.RangeProblem(number) is { } bound ? $"is out of range ({bound})" : null;
        }
        else if (problem is null && value is long integer)
        {
            problem = key.RangeProblem(integer) is { } bound ? $"is out of range ({bound})" : null;
        }
        else if (problem is null && value is double[] list)
        {
            problem = ListProblem(list, key);
        }

        if (problem is not null)
        {
            errors.Key(entry.Line, path, entry.ValueText, problem, key.Allowed);
            values.MarkInvalid(key.Name);
            return;
        }

        values.Set(key.Name, value!, entry.Line, entry.ValueText);
    }

    /// <summary>The typed value, or a problem such as "is not an integer".</summary>
    private static (object? Value, string? Problem) Convert(ValueSyntax? node, KeySpec key) => key.Kind switch
    {
        KeyKind.Integer => node is IntegerValueSyntax i ? (i.Value, null) : (null, "is not an integer"),
        KeyKind.Number => node switch
        {
            IntegerValueSyntax i => ((double)i.Value, null),
            FloatValueSyntax f when double.IsFinite(f.Value) => (f.Value, null),
            FloatValueSyntax => (null, "is not a finite number"),
            _ => (null, "is not a number"),
        },
        KeyKind.Choice => node switch
        {
            StringValueSyntax s when key.Choices.Contains(s.Value ?? "") => (s.Value, null),
            StringValueSyntax => (null, "is not one of the allowed values"),
            _ => (null, "is not a string"),
        },
        KeyKind.Timestamp => node switch
        {
            StringValueSyntax s when Rfc3339.TryParse(s.Value ?? "", out var t) => (t, null),
            DateTimeValueSyntax { Kind: SyntaxKind.OffsetDateTimeByZ or SyntaxKind.OffsetDateTimeByNumber } d
                when Rfc3339.TryParse(d.Token?.Text ?? "", out var t) => (t, null),
            _ => (null, "is not an RFC 3339 timestamp with a UTC offset"),
        },
        KeyKind.NumberList => node is ArraySyntax array ? Numbers(array) : (null, "is not an array of numbers"),
        _ => node switch
        {
            StringValueSyntax s when !string.IsNullOrWhiteSpace(s.Value) && s.Value.Length <= KeySpec.MaxTextLength => (s.Value, null),
            StringValueSyntax => (null, "is empty or too long"),
            _ => (null, "is not a string"),
        },
    };

    private static (object? Value, string? Problem) Numbers(ArraySyntax array)
    {
        var items = new List<double>();
        foreach (var item in array.Items)
        {
            switch (item.Value)
            {
                case IntegerValueSyntax i:
                    items.Add(i.Value);
                    break;
                case FloatValueSyntax f when double.IsFinite(f.Value):
                    items.Add(f.Value);
                    break;
                default:
                    return (null, $"item {items.Count + 1} is not a finite number");
            }
        }

        return (items.ToArray(), null);
    }

    /// <summary>Length 1 .. MaxListLength, every item in range (items counted from 1).</summary>
    private static string? ListProblem(double[] list, KeySpec key)
    {
        if (list.Length is 0 or > KeySpec.MaxListLength)
        {
            return $"has {list.Length} items";
        }

        for (int i = 0; i < list.Length; i++)
        {
            if (key.RangeProblem(list[i]) is { } bound)
            {
                return $"item {i + 1} ({KeySpec.Format(list[i])}) is out of range ({bound})";
            }
        }

        return null;
    }

    private static object Normalise(KeySpec key, object fallback) => key.Kind switch
    {
        KeyKind.Number => System.Convert.ToDouble(fallback, System.Globalization.CultureInfo.InvariantCulture),
        KeyKind.Timestamp when Rfc3339.TryParse((string)fallback, out var t) => t,
        _ => fallback,
    };

    private static string DefaultText(object fallback) => fallback switch
    {
        double d => KeySpec.Format(d),
        string s => $"\"{s}\"",
        _ => System.Convert.ToString(fallback, System.Globalization.CultureInfo.InvariantCulture) ?? "",
    };
}

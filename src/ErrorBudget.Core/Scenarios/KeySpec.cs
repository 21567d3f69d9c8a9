using System.Globalization;

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// One scenario key: its name (with its unit), value kind, default and static range. Ranges that
/// depend on another key (planes divides satellites, step below duration...) are rules, not specs.
/// </summary>
internal sealed record KeySpec(string Name, KeyKind Kind)
{
    public const int MaxTextLength = 64;

    /// <summary>Most items a <see cref="KeyKind.NumberList"/> accepts.</summary>
    public const int MaxListLength = 32;

    /// <summary>Value used when the key is left out: long, double or string. Null: none.</summary>
    public object? Default { get; init; }

    /// <summary>Left out is fine and has no default here: the loader fills it in (shell names, [assumed] inheritance).</summary>
    public bool Optional { get; init; }

    public double? Min { get; init; }

    public bool MinInclusive { get; init; } = true;

    public double? Max { get; init; }

    public bool MaxInclusive { get; init; } = true;

    public IReadOnlyList<string> Choices { get; init; } = [];

    /// <summary>Replaces the generated "allowed" text when the real range depends on other keys.</summary>
    public string? AllowedText { get; init; }

    public bool IsRequired => Default is null && !Optional;

    public string Allowed => AllowedText ?? Kind switch
    {
        KeyKind.Integer => "integer " + RangeText(),
        KeyKind.Number => RangeText(),
        KeyKind.Choice => string.Join(", ", Choices.Select(c => $"\"{c}\"")),
        KeyKind.Timestamp => "an RFC 3339 UTC timestamp such as \"2031-06-01T00:00:00Z\"",
        KeyKind.NumberList => $"an array of 1 to {MaxListLength} numbers, each {RangeText()}",
        _ => $"a non-empty string of at most {MaxTextLength} characters",
    };

    public static KeySpec Integer(string name, long? min = null, long? max = null, long? defaultValue = null) =>
        new(name, KeyKind.Integer) { Min = min, Max = max, Default = defaultValue };

    public static KeySpec Number(
        string name, double? min = null, double? max = null, double? defaultValue = null,
        bool minInclusive = true, bool maxInclusive = true) =>
        new(name, KeyKind.Number)
        {
            Min = min, Max = max, Default = defaultValue, MinInclusive = minInclusive, MaxInclusive = maxInclusive,
        };

    /// <summary>An optional array of numbers, each in the range (no default: left out means not given).</summary>
    public static KeySpec NumberList(string name, double? min = null, double? max = null, bool minInclusive = true) =>
        new(name, KeyKind.NumberList) { Min = min, Max = max, MinInclusive = minInclusive, Optional = true };

    public static KeySpec Choice(string name, string defaultValue, params string[] choices) =>
        new(name, KeyKind.Choice) { Choices = choices, Default = defaultValue };

    /// <summary>The violated bound, e.g. "must be &gt;= 0", or null when <paramref name="value"/> is in range.</summary>
    public string? RangeProblem(double value)
    {
        if (Min is { } min && (MinInclusive ? value < min : value <= min))
        {
            return $"must be {(MinInclusive ? ">=" : ">")} {Format(min)}";
        }

        if (Max is { } max && (MaxInclusive ? value > max : value >= max))
        {
            return $"must be {(MaxInclusive ? "<=" : "<")} {Format(max)}";
        }

        return null;
    }

    public static string Format(double value) => value.ToString(CultureInfo.InvariantCulture);

    private string RangeText() => (Min, Max) switch
    {
        ({ } min, { } max) => $"{Format(min)} {Less(MinInclusive)} {Name} {Less(MaxInclusive)} {Format(max)}",
        ({ } min, null) => $"{Name} {(MinInclusive ? ">=" : ">")} {Format(min)}",
        (null, { } max) => $"{Name} {Less(MaxInclusive)} {Format(max)}",
        _ => "any finite number",
    };

    private static string Less(bool inclusive) => inclusive ? "<=" : "<";
}

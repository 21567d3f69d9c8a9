namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// The values of one table that passed their type and range checks, plus defaults; a key that
/// failed (or is missing) is absent, so rules over it are skipped rather than reported twice.
/// </summary>
internal sealed class SectionValues(string path, int tableLine)
{
    private readonly Dictionary<string, (object Value, int Line, string Text)> _values = new(StringComparer.Ordinal);
    private readonly HashSet<string> _invalid = new(StringComparer.Ordinal);

    /// <summary>Key prefix: <c>grid</c>, <c>shell[2]</c>.</summary>
    public string Path { get; } = path;

    /// <summary>1-based line of the table header; 0 when the table was left out.</summary>
    public int TableLine { get; } = tableLine;

    public void Set(string key, object value, int line, string text) => _values[key] = (value, line, text);

    public bool Has(params string[] keys) => keys.All(_values.ContainsKey);

    /// <summary>Records a key that was written but failed its own checks (already reported).</summary>
    public void MarkInvalid(string key) => _invalid.Add(key);

    /// <summary>True when the key was written, valid or not: rules about its presence should not report it again.</summary>
    public bool Given(string key) => _values.ContainsKey(key) || _invalid.Contains(key);

    /// <summary>True when the key was written but failed its own checks.</summary>
    public bool IsInvalid(string key) => _invalid.Contains(key);

    public long Integer(string key) => (long)_values[key].Value;

    public double Number(string key) => (double)_values[key].Value;

    public string Text(string key) => (string)_values[key].Value;

    public IReadOnlyList<double> Numbers(string key) => (double[])_values[key].Value;

    /// <summary>True when the key was written in the file (present and not a default, which sits on the table line).</summary>
    public bool Written(string key) => TableLine != 0 && _values.TryGetValue(key, out var v) && v.Line != TableLine;

    public DateTimeOffset Time(string key) => (DateTimeOffset)_values[key].Value;

    /// <summary>Line of the key, or of the table when the value is a default.</summary>
    public int LineOf(string key) => _values[key].Line;

    /// <summary>The value as written, or the default formatted.</summary>
    public string TextOf(string key) => _values[key].Text;

    public string KeyPath(string key) => $"{Path}.{key}";

    /// <summary><c>shell[1].planes = 4</c>, for rules that name a second key.</summary>
    public string Describe(string key) => $"{KeyPath(key)} = {TextOf(key)}";

    /// <summary>Reports a rule failure against <paramref name="key"/> at its line.</summary>
    public void Fail(ScenarioErrorList errors, string key, string problem, string allowed) =>
        errors.Key(LineOf(key), KeyPath(key), TextOf(key), problem, allowed);
}

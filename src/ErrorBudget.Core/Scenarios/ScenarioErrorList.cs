namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// Collects the problems of one scenario and words every message the same way:
/// <c>{source}:{line}: {subject} {problem}; allowed: {allowed}</c>, where the subject is
/// <c>key = value</c> as written (or just the key or table when there is no value).
/// </summary>
internal sealed class ScenarioErrorList(string sourceName)
{
    private readonly List<ScenarioError> _errors = [];
    private readonly HashSet<int> _tableLines = [];

    public int Count => _errors.Count;

    /// <summary>A problem with a key (and its value, when there is one).</summary>
    public void Key(int line, string key, string valueText, string problem, string allowed)
    {
        var subject = valueText.Length == 0 ? key : $"{key} = {valueText}";
        _errors.Add(new ScenarioError(key, valueText, allowed, line, $"{Where(line)}: {subject} {problem}; allowed: {allowed}"));
    }

    /// <summary>A problem with a whole table; <paramref name="written"/> is how it appears, e.g. <c>[grid]</c>.</summary>
    public void Table(int line, string key, string written, string problem, string allowed)
    {
        _tableLines.Add(line);
        _errors.Add(new ScenarioError(key, "", allowed, line, $"{Where(line)}: {written} {problem}; allowed: {allowed}"));
    }

    /// <summary>A TOML syntax diagnostic, reported with its own text.</summary>
    public void Syntax(int line, string key, string diagnostic)
    {
        var near = key.Length == 0 ? "" : $" at {key}";
        _errors.Add(new ScenarioError(key, "", "valid TOML", line, $"{Where(line)}: invalid TOML{near}: {diagnostic}; allowed: valid TOML"));
    }

    /// <summary>True when <paramref name="line"/> already carries an error.</summary>
    public bool HasLine(int line) => _errors.Exists(e => e.Line == line);

    /// <summary>True when a table-level error (unknown, duplicate, wrong brackets) was reported at header line <paramref name="line"/>.</summary>
    public bool HasTableError(int line) => line > 0 && _tableLines.Contains(line);

    /// <summary>The errors in line order (stable: same line keeps the order found).</summary>
    public IReadOnlyList<ScenarioError> Sorted() => [.. _errors.OrderBy(e => e.Line)];

    public void ThrowIfAny()
    {
        if (_errors.Count > 0)
        {
            throw new ScenarioException(Sorted());
        }
    }

    private string Where(int line) => line > 0 ? $"{sourceName}:{line}" : sourceName;
}

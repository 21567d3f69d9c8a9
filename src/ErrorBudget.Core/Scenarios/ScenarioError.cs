namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// One problem found in a scenario file, worded one way:
/// <c>scenario.toml:14: grid.mask_deg = 95 is out of range (must be &lt; 90); allowed: 0 &lt;= mask_deg &lt; 90</c>.
/// </summary>
/// <param name="Key">Dotted key (<c>grid.mask_deg</c>, <c>shell[2].planes</c>; shells count from 1), a table
/// name (<c>grid</c>) for table-level problems, or empty for a TOML syntax error that no key owns.</param>
/// <param name="Value">The value as written in the file (strings keep their quotes); empty when there is none.</param>
/// <param name="Allowed">What would have been accepted.</param>
/// <param name="Line">1-based line of the key; for a missing key the line of its table; 0 when unknown
/// (a missing table, an unreadable file).</param>
/// <param name="Message">One full sentence: source, line, key, value, problem and what is allowed.</param>
public sealed record ScenarioError(string Key, string Value, string Allowed, int Line, string Message);

using Tomlyn.Syntax;

namespace ErrorBudget.Core.Scenarios;

/// <summary>One <c>key = value</c> as written in a scenario file.</summary>
/// <param name="Key">The key as written (dotted keys joined with '.').</param>
/// <param name="Value">The value node; null only after a syntax error.</param>
/// <param name="Line">1-based line of the key.</param>
/// <param name="ValueText">The value's source text (strings keep their quotes), shortened for messages.</param>
internal sealed record TomlEntry(string Key, ValueSyntax? Value, int Line, string ValueText);

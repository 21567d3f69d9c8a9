using System.Text.RegularExpressions;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// Tomlyn's diagnostics of a document parsed with validate: true, split into pure syntax errors
/// (those a parse without validation also gives) and validation errors (keys or tables defined
/// twice or in conflict), and turned into scenario errors with 1-based lines.
/// </summary>
internal sealed partial class TomlDiagnostics
{
    private readonly int _endOfFileLine;

    private TomlDiagnostics(List<DiagnosticMessage> syntax, List<DiagnosticMessage> validation, int endOfFileLine)
    {
        Syntax = syntax;
        Validation = validation;
        _endOfFileLine = endOfFileLine;
    }

    public IReadOnlyList<DiagnosticMessage> Syntax { get; }

    public IReadOnlyList<DiagnosticMessage> Validation { get; }

    public static TomlDiagnostics Split(DocumentSyntax validated, string text, string sourceName)
    {
        if (validated.Diagnostics.Count == 0)
        {
            return new TomlDiagnostics([], [], 0);
        }

        var syntaxOnly = SyntaxParser.Parse(text, sourceName, validate: false).Diagnostics.Select(Identity).ToHashSet();
        var all = validated.Diagnostics.ToList();
        return new TomlDiagnostics(
            [.. all.Where(d => syntaxOnly.Contains(Identity(d)))],
            [.. all.Where(d => !syntaxOnly.Contains(Identity(d)))],
            text.Count(c => c == '\n') + 1);
    }

    /// <summary>
    /// Reports the syntax errors, and the validation errors our own checks did not already word:
    /// those on a line that carries an error (a duplicate key) or inside a table whose header does
    /// (wrong brackets, a table defined twice) would repeat it.
    /// </summary>
    public void Report(TomlDocument tree, ScenarioErrorList errors)
    {
        var fresh = Validation
            .Where(d => !errors.HasLine(LineOf(d)) && !errors.HasTableError(tree.HeaderOf(LineOf(d))))
            .ToList();
        foreach (var diagnostic in Syntax.Concat(fresh))
        {
            errors.Syntax(LineOf(diagnostic), tree.KeyAt(LineOf(diagnostic)), Shorten(diagnostic.Message));
        }
    }

    /// <summary>
    /// 1-based line (Tomlyn spans are 0-based). Some end-of-file diagnostics (an unclosed array)
    /// come with the position of the file's first character: they belong to its last line.
    /// </summary>
    private int LineOf(DiagnosticMessage d) =>
        d.Span.Start.Offset == 0 && d.Message.Contains("<eof>", StringComparison.Ordinal) ? _endOfFileLine : d.Span.Start.Line + 1;

    private static (int Line, int Column, string Message) Identity(DiagnosticMessage d) =>
        (d.Span.Start.Line, d.Span.Start.Column, d.Message);

    /// <summary>Quoted fragments over 40 characters (Tomlyn quotes whole tables) cut to a readable length.</summary>
    private static string Shorten(string message) =>
        LongQuote().Replace(message, m => $"`{m.Groups[1].Value}...`");

    [GeneratedRegex("`([^`]{40})[^`]+`", RegexOptions.CultureInvariant)]
    private static partial Regex LongQuote();
}

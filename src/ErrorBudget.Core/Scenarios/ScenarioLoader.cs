using Tomlyn.Parsing;

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// Reads a scenario TOML file strictly: TOML syntax first, then unknown/missing/duplicate tables and
/// keys, value types, ranges and cross-key rules. Every problem is collected and thrown once as a
/// <see cref="ScenarioException"/>; nothing is built from an invalid file. The key list and ranges
/// are in <see cref="ScenarioSchema"/>.
/// </summary>
public static class ScenarioLoader
{
    /// <summary>Loads a scenario from TOML text.</summary>
    /// <param name="text">The scenario file's contents.</param>
    /// <param name="sourceName">Name used in messages and kept in <see cref="Scenario.SourceName"/>.</param>
    /// <exception cref="ScenarioException">The text is not a valid scenario; every problem is listed.</exception>
    public static Scenario Load(string text, string sourceName)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(sourceName);
        var errors = new ScenarioErrorList(sourceName);
        var document = SyntaxParser.Parse(text, sourceName, validate: true);
        var tree = TomlDocument.Read(document, text, errors);
        var diagnostics = TomlDiagnostics.Split(document, text, sourceName);
        if (diagnostics.Syntax.Count > 0)
        {
            // Past a syntax error the structure is unknown: further checks would only add noise.
            diagnostics.Report(tree, errors);
            errors.ThrowIfAny();
        }

        var values = ScenarioValidator.Validate(tree, errors);
        diagnostics.Report(tree, errors); // validation diagnostics our checks did not already explain
        errors.ThrowIfAny();
        return ScenarioBuilder.Build(values) with { SourceText = text, SourceName = sourceName };
    }

    /// <summary>Loads a scenario file; the path as given is the source name in messages.</summary>
    /// <exception cref="ScenarioException">The file cannot be read or is not a valid scenario.</exception>
    public static Scenario LoadFile(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        string text;
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            var reason = e switch
            {
                _ when Directory.Exists(path) => "it is a folder, not a file",
                FileNotFoundException or DirectoryNotFoundException => "the file does not exist",
                UnauthorizedAccessException => "permission denied",
                _ => e.Message,
            };
            var message = $"{path}: cannot read the scenario file ({reason}); allowed: the path of a readable TOML file";
            throw new ScenarioException([new ScenarioError("", path, "the path of a readable TOML file", 0, message)], e);
        }

        return Load(text, path);
    }
}

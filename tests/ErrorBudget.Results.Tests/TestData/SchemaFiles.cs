using System.Text.Json;

namespace ErrorBudget.Results.Tests.TestData;

/// <summary>The checked-in schema documents: the copies in the test output folder, and the repository folder for regeneration.</summary>
internal static class SchemaFiles
{
    /// <summary>Set to 1 to rewrite results-schema/ from the definitions instead of comparing.</summary>
    public const string RegenerateVariable = "ERRORBUDGET_REGENERATE_SCHEMAS";

    /// <summary>results-schema/ as copied beside the test assembly by the test project.</summary>
    public static string CopiedFolder => Path.Combine(AppContext.BaseDirectory, "results-schema");

    /// <summary>results-schema/ at the repository root (found by walking up to ErrorBudget.sln).</summary>
    public static string RepositoryFolder()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "ErrorBudget.sln")))
            {
                return Path.Combine(dir.FullName, "results-schema");
            }
        }

        throw new DirectoryNotFoundException("ErrorBudget.sln not found above the test assembly.");
    }

    public static JsonDocument Load(string name) =>
        JsonDocument.Parse(File.ReadAllText(Path.Combine(CopiedFolder, $"{name}.schema.json")));
}

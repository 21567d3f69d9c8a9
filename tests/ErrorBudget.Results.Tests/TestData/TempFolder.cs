namespace ErrorBudget.Results.Tests.TestData;

/// <summary>A fresh folder under the system temp folder, deleted on dispose. <see cref="Output"/> does not exist yet.</summary>
internal sealed class TempFolder : IDisposable
{
    public TempFolder()
    {
        Root = Path.Combine(Path.GetTempPath(), "errorbudget-results-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Root);
    }

    /// <summary>The parent folder, owned by this test.</summary>
    public string Root { get; }

    /// <summary>A result set folder inside <see cref="Root"/> (not created).</summary>
    public string Output => Path.Combine(Root, "run-out");

    /// <summary>Names of everything in <see cref="Root"/>, sorted.</summary>
    public string[] Entries() => Directory.EnumerateFileSystemEntries(Root).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray()!;

    public void Dispose()
    {
        try
        {
            Directory.Delete(Root, recursive: true);
        }
        catch (DirectoryNotFoundException)
        {
        }
    }
}

namespace ErrorBudget.Results;

/// <summary>The output folder already holds something and replacing it was not asked for.</summary>
public sealed class ResultSetExistsException : IOException
{
    public ResultSetExistsException(string outputDirectory)
        : base($"The output folder '{outputDirectory}' already exists; use --force to replace it.")
    {
        OutputDirectory = outputDirectory;
    }

    /// <summary>The folder that exists (full path).</summary>
    public string OutputDirectory { get; }
}

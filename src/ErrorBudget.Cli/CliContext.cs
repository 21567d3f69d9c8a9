namespace ErrorBudget.Cli;

/// <summary>Where a command writes: stdout for data and reports, stderr for progress and errors.</summary>
public sealed record CliContext(TextWriter Output, TextWriter Error, bool InteractiveConsole)
{
    /// <summary>CI=true (or a redirected stderr) asks for plain progress lines instead of a live bar.</summary>
    public static bool IsCi =>
        string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    public bool LiveProgress => InteractiveConsole && !IsCi && !System.Console.IsErrorRedirected;
}

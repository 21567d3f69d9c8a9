namespace ErrorBudget.Cli;

/// <summary>The process exit codes, documented in README ("Exit codes").</summary>
public enum ExitCode
{
    /// <summary>The command did what was asked.</summary>
    Done = 0,

    /// <summary>Something failed while running (I/O error, cancellation, an internal error).</summary>
    Failure = 1,

    /// <summary>The input was wrong: command line, scenario file, or an existing output folder without --force.</summary>
    BadInput = 2,
}

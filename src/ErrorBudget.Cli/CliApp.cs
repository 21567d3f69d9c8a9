using System.CommandLine;
using System.Reflection;
using ErrorBudget.Cli.Commands;

namespace ErrorBudget.Cli;

/// <summary>Builds the `errorbudget` command tree and runs it with injectable writers (tests use StringWriters).</summary>
public static class CliApp
{
    public static string ToolVersion { get; } =
        typeof(CliApp).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0] ?? "0.0.0";

    /// <param name="interactiveConsole">True only from Program.Main: allows a live progress bar when stderr is a terminal.</param>
    public static async Task<int> RunAsync(string[] args, TextWriter output, TextWriter error, bool interactiveConsole, CancellationToken ct)
    {
        var context = new CliContext(output, error, interactiveConsole);
        var root = new RootCommand(
            "ErrorBudget: Monte Carlo navigation error budgets (satellite clock and orbit errors, user residuals, " +
            "geometry over a ground grid) written as Parquet result sets. Exit codes: 0 done, 1 failure, 2 bad input.")
        {
            RunCommand.Create(context),
            CheckCommand.Create(context),
            BenchCommand.Create(context),
        };

        ParseResult parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            foreach (var e in parse.Errors)
            {
                await error.WriteLineAsync($"error: {e.Message}").ConfigureAwait(false);
            }

            await error.WriteLineAsync("Try 'errorbudget --help'.").ConfigureAwait(false);
            return (int)ExitCode.BadInput;
        }

        // Expected failures are handled in the commands; anything else is a defect: one line on stderr
        // (no stack trace for the user), exit 1, and nothing written (result sets are atomic).
        var config = new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false };
        try
        {
            return await parse.InvokeAsync(config, ct).ConfigureAwait(false);
        }
        catch (Exception ex) when (ex is not OperationCanceledException)
        {
            await error.WriteLineAsync($"failure: internal error ({ex.GetType().Name}): {ex.Message}; please report it with the scenario file").ConfigureAwait(false);
            return (int)ExitCode.Failure;
        }
    }
}

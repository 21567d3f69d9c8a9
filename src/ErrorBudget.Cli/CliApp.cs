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

        var config = new InvocationConfiguration { Output = output, Error = error };
        return await parse.InvokeAsync(config, ct).ConfigureAwait(false);
    }
}

using System.CommandLine;
using ErrorBudget.Cli.Progress;
using ErrorBudget.Cli.Reports;
using ErrorBudget.Core.Simulation;
using ErrorBudget.Results;

namespace ErrorBudget.Cli.Commands;

/// <summary>`errorbudget run SCENARIO --out DIR`: the Monte Carlo run and its result set.</summary>
internal static class RunCommand
{
    public static Command Create(CliContext context)
    {
        var scenario = CommonOptions.Scenario();
        var output = new Option<DirectoryInfo>("--out", "-o") { Description = "Result-set folder to create (written atomically).", Required = true };
        var trials = CommonOptions.Trials();
        var seed = CommonOptions.Seed();
        var threads = CommonOptions.Threads();
        var force = new Option<bool>("--force", "-f") { Description = "Replace an existing result-set folder." };
        var quiet = CommonOptions.Quiet();
        var exact = new Option<bool>("--exact")
        {
            Description = "Compute the HPE/VPE percentiles exactly from the Gaussian position-error distributions instead of sampling (Gaussian budgets, with or without a relativistic bias: no faults, graded clocks, upload jitter or [integrity]).",
        };
        var command = new Command("run", "Run the scenario and write its result set (cells, epochs, relativity, clocks, age_of_data, availability, integrity and overbound Parquet tables, summary.json).")
        {
            scenario, output, trials, seed, threads, force, quiet, exact,
        };

        command.SetAction(async (pr, ct) => (int)await ExecuteAsync(
            context,
            pr.GetValue(scenario)!,
            pr.GetValue(output)!,
            pr.GetValue(trials),
            pr.GetValue(seed),
            pr.GetValue(threads),
            pr.GetValue(force),
            pr.GetValue(quiet),
            pr.GetValue(exact),
            ct).ConfigureAwait(false));
        return command;
    }

    private static async Task<ExitCode> ExecuteAsync(
        CliContext context, FileInfo file, DirectoryInfo outDir, int? trials, long? seed, int threads, bool force, bool quiet, bool exact, CancellationToken ct)
    {
        if (CommonOptions.Validate(trials, seed, threads) is string bad)
        {
            await context.Error.WriteLineAsync($"error: {bad}").ConfigureAwait(false);
            return ExitCode.BadInput;
        }

        var scenario = await ScenarioInput.LoadAsync(context, file, trials, seed).ConfigureAwait(false);
        if (scenario is null)
        {
            return ExitCode.BadInput;
        }

        if (exact && Core.Exact.ExactEligibility.WhyNot(scenario) is string why)
        {
            await context.Error.WriteLineAsync($"error: --exact cannot run {file.Name}: {why}").ConfigureAwait(false);
            return ExitCode.BadInput;
        }

        if (outDir.Exists && !force)
        {
            await context.Error.WriteLineAsync(
                $"error: the output folder '{outDir.FullName}' already exists; choose another --out or add --force to replace it").ConfigureAwait(false);
            return ExitCode.BadInput;
        }

        try
        {
            var options = new RunOptions { Threads = threads, ToolVersion = CliApp.ToolVersion };
            RunResult result = exact
                ? await ProgressDisplay.RunAsync(context, quiet, "exact percentiles", progress => Core.Exact.ExactEngine.RunAsync(scenario, options with { Progress = progress }, ct)).ConfigureAwait(false)
                : await ProgressDisplay.RunAsync(
                    context, quiet, "simulating", progress => MonteCarloEngine.RunAsync(scenario, options with { Progress = progress }, ct)).ConfigureAwait(false);
            await ResultSetWriter.WriteAsync(result, outDir.FullName, force, ct).ConfigureAwait(false);
            await RunReport.WriteAsync(context.Output, result, outDir.FullName).ConfigureAwait(false);
            return ExitCode.Done;
        }
        catch (OperationCanceledException)
        {
            await context.Error.WriteLineAsync("cancelled: nothing was written").ConfigureAwait(false);
            return ExitCode.Failure;
        }
        catch (ResultSetExistsException ex)
        {
            await context.Error.WriteLineAsync($"error: {ex.Message}").ConfigureAwait(false);
            return ExitCode.BadInput;
        }
        catch (IOException ex)
        {
            await context.Error.WriteLineAsync($"failure: could not write the result set: {ex.Message}").ConfigureAwait(false);
            return ExitCode.Failure;
        }
        catch (UnauthorizedAccessException ex)
        {
            await context.Error.WriteLineAsync($"failure: could not write the result set: {ex.Message}").ConfigureAwait(false);
            return ExitCode.Failure;
        }
    }
}

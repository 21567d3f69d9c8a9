using System.CommandLine;
using ErrorBudget.Cli.Reports;

namespace ErrorBudget.Cli.Commands;

/// <summary>`errorbudget check SCENARIO`: validates and tells what the scenario implies, without running it.</summary>
internal static class CheckCommand
{
    public static Command Create(CliContext context)
    {
        var scenario = CommonOptions.Scenario();
        var trials = CommonOptions.Trials();
        var seed = CommonOptions.Seed();
        var threads = CommonOptions.Threads();
        var command = new Command("check", "Validate a scenario and print what it implies (orbits, visibility, samples, time and memory estimates).")
        {
            scenario, trials, seed, threads,
        };
        command.SetAction(async (pr, ct) =>
        {
            int? n = pr.GetValue(trials);
            long? s = pr.GetValue(seed);
            int t = pr.GetValue(threads);
            if (CommonOptions.Validate(n, s, t) is string bad)
            {
                await context.Error.WriteLineAsync($"error: {bad}").ConfigureAwait(false);
                return (int)ExitCode.BadInput;
            }

            var loaded = await ScenarioInput.LoadAsync(context, pr.GetValue(scenario)!, n, s).ConfigureAwait(false);
            if (loaded is null)
            {
                return (int)ExitCode.BadInput;
            }

            await CheckReport.WriteAsync(context.Output, loaded, t, ct).ConfigureAwait(false);
            return (int)ExitCode.Done;
        });
        return command;
    }
}

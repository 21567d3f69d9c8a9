using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Cli.Commands;

/// <summary>Loads a scenario for a command and applies the command-line overrides; reports bad input.</summary>
internal static class ScenarioInput
{
    /// <summary>The scenario, or null after writing every problem to stderr.</summary>
    public static async Task<Scenario?> LoadAsync(CliContext context, FileInfo file, int? trials, long? seed)
    {
        try
        {
            var scenario = ScenarioLoader.LoadFile(file.FullName);
            var run = scenario.Run;
            if (trials is int n)
            {
                run = run with { Trials = n };
            }

            if (seed is long s)
            {
                run = run with { Seed = (ulong)s };
            }

            return scenario with { Run = run };
        }
        catch (ScenarioException ex)
        {
            foreach (var e in ex.Errors)
            {
                await context.Error.WriteLineAsync($"error: {e.Message}").ConfigureAwait(false);
            }

            if (ex.Errors.Count == 0)
            {
                await context.Error.WriteLineAsync($"error: {ex.Message}").ConfigureAwait(false);
            }

            return null;
        }
    }
}

namespace ErrorBudget.Cli;

internal static class Program
{
    private static async Task<int> Main(string[] args) =>
        await CliApp.RunAsync(args, Console.Out, Console.Error, interactiveConsole: true, CancellationToken.None).ConfigureAwait(false);
}

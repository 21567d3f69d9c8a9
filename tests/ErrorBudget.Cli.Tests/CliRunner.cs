using ErrorBudget.Cli;

namespace ErrorBudget.Cli.Tests;

/// <summary>Runs the CLI in-process with captured output.</summary>
internal static class CliRunner
{
    public static string ScenarioPath(string name) => Path.Combine(AppContext.BaseDirectory, "scenarios", name);

    public static async Task<(int Code, string Out, string Err)> RunAsync(params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        int code = await CliApp.RunAsync(args, output, error, interactiveConsole: false, CancellationToken.None);
        return (code, output.ToString(), error.ToString());
    }

    public static string NewTempFolder()
    {
        string path = Path.Combine(Path.GetTempPath(), "errorbudget-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(path);
        return path;
    }
}

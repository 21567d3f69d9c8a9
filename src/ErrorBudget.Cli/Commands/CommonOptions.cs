using System.CommandLine;

namespace ErrorBudget.Cli.Commands;

/// <summary>Options shared by several commands, declared once with their ranges.</summary>
internal static class CommonOptions
{
    public const int MaxTrials = 1_000_000;
    public const int MaxThreads = 1024;

    public static Argument<FileInfo> Scenario() => new("scenario") { Description = "Scenario file (TOML); see README, 'Scenario reference'." };

    public static Option<int?> Trials() => new("--trials", "-n") { Description = $"Monte Carlo trials, overriding [run].trials (1 .. {MaxTrials:N0})." };

    public static Option<long?> Seed() => new("--seed", "-s") { Description = "Master seed, overriding [run].seed (0 .. 2^63-1)." };

    public static Option<int> Threads() => new("--threads", "-t")
    {
        Description = $"Worker threads (1 .. {MaxThreads}); results do not depend on it.",
        DefaultValueFactory = _ => Environment.ProcessorCount,
    };

    public static Option<bool> Quiet() => new("--quiet", "-q") { Description = "No progress output." };

    /// <summary>Checks the numeric options; returns an error message or null.</summary>
    public static string? Validate(int? trials, long? seed, int threads)
    {
        if (trials is < 1 or > MaxTrials)
        {
            return $"--trials {trials} is out of range; allowed: 1 <= trials <= {MaxTrials}";
        }

        if (seed is < 0)
        {
            return $"--seed {seed} is out of range; allowed: 0 <= seed <= {long.MaxValue}";
        }

        if (threads is < 1 or > MaxThreads)
        {
            return $"--threads {threads} is out of range; allowed: 1 <= threads <= {MaxThreads}";
        }

        return null;
    }
}

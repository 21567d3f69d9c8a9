using System.Diagnostics;
using System.Globalization;
using Spectre.Console;

namespace ErrorBudget.Cli.Progress;

/// <summary>
/// Shows how a long job advances: a live bar on a terminal (Spectre.Console, on stderr), plain
/// lines when stderr is redirected or CI=true (at most one every 20 s, plus a final line), nothing
/// with --quiet. stdout stays for reports and data.
/// </summary>
internal static class ProgressDisplay
{
    private static readonly TimeSpan PlainInterval = TimeSpan.FromSeconds(20);

    public static async Task<T> RunAsync<T>(CliContext context, bool quiet, string label, Func<Action<long, long>, Task<T>> work)
    {
        long done = 0, total = 1;
        void Report(long d, long t)
        {
            Volatile.Write(ref total, t);
            Volatile.Write(ref done, d);
        }

        if (quiet)
        {
            return await work(Report).ConfigureAwait(false);
        }

        if (context.LiveProgress)
        {
            var console = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(System.Console.Error) });
            return await console.Progress()
                .Columns(new TaskDescriptionColumn(), new ProgressBarColumn(), new PercentageColumn(), new ElapsedTimeColumn(), new RemainingTimeColumn())
                .StartAsync(async ctx =>
                {
                    var task = ctx.AddTask(label, maxValue: 1.0);
                    var job = work(Report);
                    while (!job.IsCompleted)
                    {
                        task.Value = Fraction(Volatile.Read(ref done), Volatile.Read(ref total));
                        await Task.WhenAny(job, Task.Delay(200)).ConfigureAwait(false);
                    }

                    task.Value = 1.0;
                    return await job.ConfigureAwait(false);
                }).ConfigureAwait(false);
        }

        var clock = Stopwatch.StartNew();
        var running = work(Report);
        var last = TimeSpan.Zero;
        while (!running.IsCompleted)
        {
            await Task.WhenAny(running, Task.Delay(500)).ConfigureAwait(false);
            double fraction = Fraction(Volatile.Read(ref done), Volatile.Read(ref total));
            if (!running.IsCompleted && fraction < 1 && clock.Elapsed - last >= PlainInterval)
            {
                last = clock.Elapsed;
                await WritePlainLine(context, label, fraction, clock.Elapsed).ConfigureAwait(false);
            }
        }

        T result = await running.ConfigureAwait(false);
        await WritePlainLine(context, label, 1.0, clock.Elapsed).ConfigureAwait(false);
        return result;
    }

    private static double Fraction(long done, long total) => total <= 0 ? 0 : Math.Clamp((double)done / total, 0, 1);

    private static Task WritePlainLine(CliContext context, string label, double fraction, TimeSpan elapsed)
    {
        string left = fraction > 0.001 && fraction < 1
            ? $", about {Format(TimeSpan.FromSeconds(elapsed.TotalSeconds * (1 - fraction) / fraction))} left"
            : "";
        string line = string.Create(CultureInfo.InvariantCulture, $"{label}: {fraction * 100:0}% after {Format(elapsed)}{left}");
        return context.Error.WriteLineAsync(line);
    }

    private static string Format(TimeSpan t) => t.ToString(t.TotalHours >= 1 ? @"h\:mm\:ss" : @"m\:ss", CultureInfo.InvariantCulture);
}

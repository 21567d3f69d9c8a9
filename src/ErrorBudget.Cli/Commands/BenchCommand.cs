using System.CommandLine;
using System.Diagnostics;
using System.Globalization;
using System.Text.Json;
using ErrorBudget.Cli.Progress;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;
using ErrorBudget.Results;

namespace ErrorBudget.Cli.Commands;

/// <summary>
/// `errorbudget bench`: runs the fixed workload W1 (scenarios/w1.toml, embedded in the tool) and
/// reports user-solutions per second (users x epochs x trials / simulation wall time of the first,
/// cold run), the time to write the result set, the peak memory of the process after that run; then
/// a run with stage timers, warm runs in alternating pairs (N threads, one thread) for the parallel
/// efficiency, and the ARAIM algorithm's own cost.
/// </summary>
internal static class BenchCommand
{
    private const string WorkloadName = "w1";

    /// <summary>
    /// Warm pairs by default. On this shared host single pairs ranged from 0.55 to 1.17 within an hour
    /// (2026-12-03); the median of three drops one disturbed pair.
    /// </summary>
    private const int DefaultRounds = 3;

    private const int MaxRounds = 20;

    public static Command Create(CliContext context)
    {
        var threads = CommonOptions.Threads();
        var trials = CommonOptions.Trials();
        var json = new Option<bool>("--json") { Description = "Print one JSON object (for build servers) instead of text." };
        var quiet = CommonOptions.Quiet();
        var gridStep = new Option<double?>("--grid-step-deg")
        {
            Description = "Grid variant of W1: cell size in degrees (1: the 1-degree grid, 64,800 users); the extra timed runs then use a quarter of the trials.",
        };
        var rounds = new Option<int?>("--rounds")
        {
            Description = $"Alternating pairs of warm runs (N threads, then one) for the parallel efficiency (1 .. {MaxRounds}; default {DefaultRounds}, 1 with --grid-step-deg).",
        };
        var command = new Command("bench", "Run the fixed benchmark workload W1 and report throughput and peak memory.")
        {
            threads, trials, json, quiet, gridStep, rounds,
        };
        command.SetAction(async (pr, ct) => (int)await ExecuteAsync(
            context, pr.GetValue(threads), pr.GetValue(trials), pr.GetValue(json), pr.GetValue(quiet), pr.GetValue(gridStep), pr.GetValue(rounds), ct).ConfigureAwait(false));
        return command;
    }

    internal static Scenario LoadWorkload()
    {
        using var stream = typeof(BenchCommand).Assembly.GetManifestResourceStream("ErrorBudget.Cli.Workloads.w1.toml")
            ?? throw new InvalidOperationException("the embedded benchmark workload is missing");
        using var reader = new StreamReader(stream);
        return ScenarioLoader.Load(reader.ReadToEnd(), "w1.toml");
    }

    private static async Task<ExitCode> ExecuteAsync(
        CliContext context, int threads, int? trials, bool json, bool quiet, double? gridStep, int? rounds, CancellationToken ct)
    {
        if (CommonOptions.Validate(trials, null, threads) is string bad)
        {
            await context.Error.WriteLineAsync($"error: {bad}").ConfigureAwait(false);
            return ExitCode.BadInput;
        }

        if (rounds is < 1 or > MaxRounds)
        {
            await context.Error.WriteLineAsync($"error: --rounds {rounds} is out of range; allowed: 1 <= --rounds <= {MaxRounds}").ConfigureAwait(false);
            return ExitCode.BadInput;
        }

        if (gridStep is double step && !(step >= 0.25 && step <= 30))
        {
            await context.Error.WriteLineAsync(string.Create(CultureInfo.InvariantCulture, $"error: --grid-step-deg {step} is out of range; allowed: 0.25 <= --grid-step-deg <= 30")).ConfigureAwait(false);
            return ExitCode.BadInput;
        }

        var scenario = LoadWorkload();
        string workload = WorkloadName;
        if (gridStep is double cell)
        {
            scenario = scenario with { Grid = scenario.Grid with { LatStepDeg = cell, LonStepDeg = cell } };
            workload = string.Create(CultureInfo.InvariantCulture, $"{WorkloadName}-grid-{cell}deg");
        }
        if (trials is int n)
        {
            scenario = scenario with { Run = scenario.Run with { Trials = n } };
        }

        var options = new RunOptions { Threads = threads, ToolVersion = CliApp.ToolVersion };
        try
        {
            var clock = Stopwatch.StartNew();
            RunResult result = await ProgressDisplay.RunAsync(
                context, quiet || json, "bench w1", p => MonteCarloEngine.RunAsync(scenario, options with { Progress = p }, ct)).ConfigureAwait(false);
            double simulate = clock.Elapsed.TotalSeconds;
            long peakMemory = Process.GetCurrentProcess().PeakWorkingSet64; // before the extra runs below
            string folder = Path.Combine(Path.GetTempPath(), "errorbudget-bench-" + Guid.NewGuid().ToString("N"));
            clock.Restart();
            await ResultSetWriter.WriteAsync(result, folder, force: false, ct).ConfigureAwait(false);
            double write = clock.Elapsed.TotalSeconds;
            Directory.Delete(folder, recursive: true);

            // Issue 6: where the time goes (a second run with stage timers, which cost a few per cent) and the
            // parallel efficiency (a one-thread run: rate with N threads / (N x rate with one)).
            clock.Restart();
            // A grid variant is large: its extra runs take a quarter of the trials.
            Scenario extra = gridStep is null ? scenario : scenario with { Run = scenario.Run with { Trials = Math.Max(1, scenario.Run.Trials / 4) } };
            RunResult staged = await MonteCarloEngine.RunAsync(extra, options with { MeasureStages = true }, ct).ConfigureAwait(false);
            double stagedSeconds = clock.Elapsed.TotalSeconds;
            // Warm runs (the first run above also pays for compiling the kernel): with several threads, pairs of
            // an N-thread and a one-thread run, each pair giving one-thread time / (N x N-thread time). The
            // efficiency is the median of the pairs: a pair's two runs are adjacent in time, so a shared host's
            // slow drift cancels within it, and the median drops a pair that met a burst. With one thread
            // there is no efficiency (null in the JSON).
            int pairs = rounds ?? (gridStep is null ? DefaultRounds : 1);
            double warm = double.PositiveInfinity;
            var byRound = new List<double>();
            long extraSolutions = 0;
            for (int r = 0; r < pairs; r++)
            {
                clock.Restart();
                RunResult warmRun = await MonteCarloEngine.RunAsync(extra, options, ct).ConfigureAwait(false);
                double parallel = clock.Elapsed.TotalSeconds;
                warm = Math.Min(warm, parallel);
                extraSolutions = (long)warmRun.Cells.Count * warmRun.Epochs.Count * warmRun.Metadata.Trials;
                if (threads == 1)
                {
                    continue;
                }

                clock.Restart();
                await MonteCarloEngine.RunAsync(extra, options with { Threads = 1 }, ct).ConfigureAwait(false);
                byRound.Add(clock.Elapsed.TotalSeconds / parallel / threads);
            }

            double warmRate = extraSolutions / warm;
            double? efficiency = threads > 1 ? Median(byRound) : null;

            // Issue 5: the solution-separation algorithm alone on W1's geometry (12 epochs, 20 trials each).
            var (araimEvaluate, araimTest, _) = Core.Integrity.Araim.AraimCostProbe.Measure(scenario, 12, 20);

            long users = result.Cells.Count;
            long solutions = users * result.Epochs.Count * result.Metadata.Trials;
            var figures = new BenchFigures(
                workload, users, result.Epochs.Count, result.Metadata.Trials, solutions, solutions / simulate,
                simulate, write, peakMemory, threads, Environment.ProcessorCount, CliApp.ToolVersion,
                araimEvaluate, araimTest, efficiency, byRound, warmRate, BenchStages.From(staged.Stages!, stagedSeconds, write));
            if (json)
            {
                await context.Output.WriteLineAsync(JsonSerializer.Serialize(figures, BenchJson.Default.BenchFigures)).ConfigureAwait(false);
            }
            else
            {
                await WriteTextAsync(context.Output, figures).ConfigureAwait(false);
            }

            return ExitCode.Done;
        }
        catch (OperationCanceledException)
        {
            await context.Error.WriteLineAsync("cancelled").ConfigureAwait(false);
            return ExitCode.Failure;
        }
    }

    private static double Median(List<double> values)
    {
        var sorted = values.Order().ToArray();
        int h = sorted.Length / 2;
        return sorted.Length % 2 == 1 ? sorted[h] : (sorted[h - 1] + sorted[h]) / 2;
    }

    private static string RoundsText(IReadOnlyList<double> byRound) =>
        byRound.Count < 2 ? "" : "; each pair: " + string.Join(", ", byRound.Select(e => e.ToString("0.00", CultureInfo.InvariantCulture)));

    private static Task WriteTextAsync(TextWriter w, BenchFigures f) => w.WriteLineAsync(string.Create(CultureInfo.InvariantCulture, $"""
        workload                 {f.Workload}: {f.Users} users x {f.Epochs} epochs x {f.Trials} trials = {f.UserSolutions:N0} user-solutions
        user-solutions per second {f.UserSolutionsPerSecond / 1e6:0.0} M ({f.Threads} threads on {f.ProcessorCount} cores; first run, including compilation and first-touch memory); a warm run {f.WarmUserSolutionsPerSecond / 1e6:0.0} M
        simulation               {f.SimulationSeconds:0.00} s
        writing the result set   {f.WriteSeconds:0.00} s
        peak memory              {f.PeakMemoryBytes / 1048576.0:0} MiB
        parallel speedup         {(f.ParallelEfficiency is double e ? (e * f.Threads).ToString("0.00", CultureInfo.InvariantCulture) : "-")} on {f.Threads} threads (efficiency {(f.ParallelEfficiency is double e2 ? e2.ToString("0.00", CultureInfo.InvariantCulture) : "-")}; median of {f.EfficiencyByRound.Count} alternating warm pairs, one-thread time / {f.Threads} x {f.Threads}-thread time{RoundsText(f.EfficiencyByRound)})
        stages (thread seconds)  satellite errors {f.Stages.SatelliteErrors:0.00}, geometry {f.Stages.Geometry:0.00}, user normals {f.Stages.UserNormals:0.00}, projection {f.Stages.Projection:0.00}, sketches {f.Stages.Sketches:0.00}, integrity {f.Stages.Integrity:0.00}, writing {f.Stages.Writing:0.00} (timed run: {f.Stages.WallSeconds:0.00} s)
        ARAIM (one thread)       {f.AraimEvaluateMicroseconds:0.0} us per user-epoch (subsets, thresholds, PL search), {f.AraimTestMicroseconds:0.00} us per trial (detection test)
        """));
}

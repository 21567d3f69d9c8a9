using System.Diagnostics;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Exact;

/// <summary>
/// The exact path for Gaussian budgets (issue 6), a known bias included: the position error of every
/// (epoch, user) is a known Gaussian with a known mean, so the per-cell, per-epoch and service-area
/// percentiles of HPE and VPE are quantiles of known mixtures (equal weights over a cell's epochs; integer area weights over cells),
/// found by root finding on the mixture CDF, with no sampling noise. Refused (see
/// <see cref="ExactEligibility"/>) for budgets that need sampling.
/// </summary>
public static class ExactEngine
{
    public static Task<RunResult> RunAsync(Scenario scenario, RunOptions options, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(options);
        if (ExactEligibility.WhyNot(scenario) is string why)
        {
            throw new InvalidOperationException(why);
        }

        return Task.Run(() => Run(scenario, options, ct), ct);
    }

    private static RunResult Run(Scenario scenario, RunOptions options, CancellationToken ct)
    {
        var started = DateTimeOffset.UtcNow;
        var clock = Stopwatch.StartNew();
        int threads = Math.Max(1, options.Threads);
        var grid = ServiceGrid.From(scenario.Grid);
        var c = ExactComponents.Build(scenario, grid, threads, ct);
        var weights = AreaWeights.For(grid, (long)scenario.Run.Epochs * scenario.Run.Trials).Integer;
        int epochs = c.Epochs;
        long trials = scenario.Run.Trials;

        // Progress in mixture components handled (the cost of a quantile grows with them): a cell row
        // has one per epoch, an epoch row one per cell, each of the eight service-area quantiles all.
        long done = 0;
        long everything = (long)c.Cells * epochs;
        long total = (2 + GlobalSolves) * everything;
        void Advance(long units) => options.Progress?.Invoke(Interlocked.Add(ref done, units), total);

        var cells = new CellResult[c.Cells];
        Parallel.For(0, c.Cells, new ParallelOptions { MaxDegreeOfParallelism = threads, CancellationToken = ct }, i =>
        {
            var members = Enumerable.Range(i * epochs, epochs).ToArray();
            cells[i] = CellRow(scenario, grid.Cells[i], c, members, trials);
            Advance(epochs);
        });

        var epochRows = new EpochResult[epochs];
        Parallel.For(0, epochs, new ParallelOptions { MaxDegreeOfParallelism = threads, CancellationToken = ct }, e =>
        {
            var members = Enumerable.Range(0, c.Cells).Select(cell => (cell * epochs) + e).ToArray();
            var w = Enumerable.Range(0, c.Cells).Select(cell => (double)weights[cell]).ToArray();
            epochRows[e] = EpochRow(scenario, e, c, members, w, trials);
            Advance(c.Cells);
        });

        var all = Enumerable.Range(0, c.Cells * epochs).ToArray();
        var allWeights = all.Select(k => (double)weights[k / epochs]).ToArray();
        var global = Global(grid, c, cells, all, allWeights, trials, threads, () => Advance(everything), ct);
        clock.Stop();
        var metadata = new RunMetadata(
            MonteCarloEngine.HashOf(scenario.SourceText), scenario.Run.Seed, scenario.Run.Trials, options.ToolVersion, threads, started, clock.Elapsed.TotalSeconds);
        return new RunResult(scenario, metadata, cells, epochRows, global)
        {
            Relativity = Relativity.RelativityAnalysis.Build(scenario, ct),
            Exact = true,
        };
    }

    private static CellResult CellRow(Scenario scenario, GridCell g, ExactComponents c, int[] members, long trials)
    {
        var solved = members.Where(k => !double.IsNaN(c.SigmaUp[k])).ToArray();
        var pdop = new DDSketch(SimulationSetup.SketchAccuracy);
        var hdop = new DDSketch(SimulationSetup.SketchAccuracy);
        var vdop = new DDSketch(SimulationSetup.SketchAccuracy);
        foreach (int k in solved)
        {
            pdop.Add(c.Pdop[k]);
            hdop.Add(c.Hdop[k]);
            vdop.Add(c.Vdop[k]);
        }

        double satsMean = members.Average(k => (double)c.SatsInView[k]);
        var (hpe, vpe) = Percentiles(c, solved, null);
        return new CellResult(
            g.Index, g.LatDeg, g.LonDeg, g.AreaWeight, solved.Length * trials,
            members.Length == 0 ? double.NaN : 1.0 - ((double)solved.Length / members.Length),
            satsMean,
            PercentileReport.Percentile(pdop, solved.Length, 0.50),
            PercentileReport.Percentile(pdop, solved.Length, 0.95),
            PercentileReport.Percentile(hdop, solved.Length, 0.95),
            PercentileReport.Percentile(vdop, solved.Length, 0.95),
            hpe,
            vpe);
    }

    private static EpochResult EpochRow(Scenario scenario, int e, ExactComponents c, int[] members, double[] weights, long trials)
    {
        double total = weights.Sum();
        var solvedIndex = Enumerable.Range(0, members.Length).Where(j => !double.IsNaN(c.SigmaUp[members[j]])).ToArray();
        double unavailable = members.Select((k, j) => double.IsNaN(c.SigmaUp[k]) ? weights[j] : 0).Sum() / total;
        double sats = members.Select((k, j) => c.SatsInView[k] * weights[j]).Sum() / total;
        var pdop = new DDSketch(SimulationSetup.SketchAccuracy);
        foreach (int j in solvedIndex)
        {
            pdop.Add(c.Pdop[members[j]], (long)weights[j]);
        }

        var (hpe, vpe) = Percentiles(c, [.. solvedIndex.Select(j => members[j])], [.. solvedIndex.Select(j => weights[j])]);
        double t = scenario.Run.EpochTimeSeconds(e);
        return new EpochResult(e, t, scenario.Run.StartUtc.AddSeconds(t), solvedIndex.Length * trials, unavailable, sats,
            pdop.IsEmpty ? double.NaN : pdop.Quantile(0.50), pdop.IsEmpty ? double.NaN : pdop.Quantile(0.95), hpe, vpe);
    }

    /// <summary>Mixture quantiles solved for the service area: four levels of HPE and of VPE.</summary>
    private const int GlobalSolves = 8;

    private static GlobalFigures Global(
        ServiceGrid grid, ExactComponents c, CellResult[] cells, int[] all, double[] weights, long trials, int threads, Action solvedOne, CancellationToken ct)
    {
        var solved = Enumerable.Range(0, all.Length).Where(j => !double.IsNaN(c.SigmaUp[all[j]])).ToArray();
        var members = solved.Select(j => all[j]).ToArray();
        var w = solved.Select(j => weights[j]).ToArray();
        var (hpe, vpe) = Percentiles(c, members, w, threads, solvedOne, ct);
        double unavailable = 0;
        for (int i = 0; i < cells.Length; i++)
        {
            unavailable += grid.Cells[i].AreaWeight * (double.IsNaN(cells[i].UnavailableFraction) ? 1.0 : cells[i].UnavailableFraction);
        }

        CellResult? worstH = cells.Where(r => !double.IsNaN(r.Hpe.P95)).MaxBy(r => r.Hpe.P95);
        CellResult? worstV = cells.Where(r => !double.IsNaN(r.Vpe.P95)).MaxBy(r => r.Vpe.P95);
        return new GlobalFigures(
            members.Length * trials, unavailable, hpe, vpe,
            worstH is null ? new WorstCell(-1, double.NaN, double.NaN, double.NaN) : new WorstCell(worstH.CellIndex, worstH.LatDeg, worstH.LonDeg, worstH.Hpe.P95),
            worstV is null ? new WorstCell(-1, double.NaN, double.NaN, double.NaN) : new WorstCell(worstV.CellIndex, worstV.LatDeg, worstV.LonDeg, worstV.Vpe.P95));
    }

    /// <summary>HPE and VPE percentiles of the mixture of the given components (weights null: equal).</summary>
    private static (PercentileSet Hpe, PercentileSet Vpe) Percentiles(
        ExactComponents c, int[] members, double[]? weights, int threads = 1, Action? solved = null, CancellationToken ct = default)
    {
        if (members.Length == 0)
        {
            // Nothing to solve, but the progress still counts the solves (a run with no solution at all
            // used to stop its bar short of 100 %).
            for (int q = 0; q < 2 * PercentileSet.Levels.Length; q++)
            {
                solved?.Invoke();
            }

            return (PercentileSet.Empty, PercentileSet.Empty);
        }

        double total = weights?.Sum() ?? members.Length;
        var nodes = members.Select(k => GaussianPositionError.NodesFor(c.Lambda1[k], c.Lambda2[k])).ToArray();
        double Weighted(Func<int, double> f)
        {
            if (members.Length < 4096)
            {
                double sum = 0;
                for (int j = 0; j < members.Length; j++)
                {
                    sum += (weights?[j] ?? 1.0) * f(j);
                }

                return sum / total;
            }

            // A fixed split and a fixed order of the partial sums: the same answer for any scheduling and
            // any thread count (the split used to be 4 x threads, so --threads moved the last bits).
            const int parts = 16;
            var partial = new double[parts];
            Parallel.For(0, parts, new ParallelOptions { MaxDegreeOfParallelism = threads, CancellationToken = ct }, p =>
            {
                double sum = 0;
                for (int j = p * members.Length / parts; j < (p + 1) * members.Length / parts; j++)
                {
                    sum += (weights?[j] ?? 1.0) * f(j);
                }

                partial[p] = sum;
            });
            return partial.Sum() / total;
        }

        double minL2 = members.Min(k => c.Lambda2[k]);
        double minU = members.Min(k => c.SigmaUp[k]);
        var h = new double[PercentileSet.Levels.Length];
        var v = new double[PercentileSet.Levels.Length];
        for (int q = 0; q < h.Length; q++)
        {
            double p = PercentileSet.Levels[q];
            double rayleigh = MixtureQuantile.Rayleigh(p);
            double half = MixtureQuantile.HalfNormal(p);
            // The brackets: without means, the smallest and largest component quantiles (the bounds below
            // reduce to them bit for bit); a mean only moves probability out of a centred disc or interval
            // (Anderson's theorem: P(|m + z| <= r) <= P(|z| <= r) for a centred Gaussian z; T. W. Anderson,
            // Proc. AMS 6, 1955, from memory), and |m + z| <= |m| + |z| bounds each component's quantile above.
            double upperH = members.Max(k => Math.Sqrt((c.MeanAlong[k] * c.MeanAlong[k]) + (c.MeanAcross[k] * c.MeanAcross[k])) + (Math.Sqrt(c.Lambda1[k]) * rayleigh));
            h[q] = MixtureQuantile.Solve(
                r => Weighted(j =>
                {
                    int k = members[j];
                    return GaussianPositionError.HorizontalCdf(r, c.Lambda1[k], c.Lambda2[k], c.MeanAlong[k], c.MeanAcross[k], nodes[j]);
                }),
                p, Math.Sqrt(minL2) * rayleigh, upperH);
            solved?.Invoke();
            double upperV = members.Max(k => Math.Abs(c.MeanUp[k]) + (c.SigmaUp[k] * half));
            v[q] = MixtureQuantile.Solve(
                r => Weighted(j => GaussianPositionError.VerticalCdf(r, c.SigmaUp[members[j]], c.MeanUp[members[j]])), p, minU * half, upperV);
            solved?.Invoke();
        }

        return (new PercentileSet(h[0], h[1], h[2], h[3]), new PercentileSet(v[0], v[1], v[2], v[3]));
    }
}

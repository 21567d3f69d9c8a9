using System.Collections.Concurrent;
using System.Diagnostics;
using System.Security.Cryptography;
using System.Text;
using System.Threading.Tasks.Dataflow;
using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Runs a scenario as a TPL Dataflow pipeline:
/// (epoch, trial block) -> satellite states and satellite-level errors (parallel, bounded)
/// -> tile jobs -> parallel tile kernels -> per-cell and per-epoch accumulators -> results.
/// Bounded capacities give back-pressure, so memory holds a few epochs' satellite errors at a time
/// whatever the number of epochs and trials.
/// </summary>
public static class MonteCarloEngine
{
    public static async Task<RunResult> RunAsync(Scenario scenario, RunOptions options, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(options);
        var started = DateTimeOffset.UtcNow;
        var clock = Stopwatch.StartNew();
        var setup = new SimulationSetup(scenario, options);
        double accuracy = SimulationSetup.SketchAccuracy;
        var integrity = scenario.Integrity is null ? null : new IntegrityKernel(setup);
        var cells = new CellAccumulator[setup.Grid.Count];
        for (int i = 0; i < cells.Length; i++)
        {
            cells[i] = new CellAccumulator(accuracy) { Integrity = integrity is null ? null : new IntegrityCellAccumulator(accuracy) };
        }

        int threads = Math.Max(1, options.Threads);
        // Every stage of the run (satellite errors, tile kernels, the relativity figures) shares one
        // scheduler of `threads` slots, so --threads N uses N cores at most: a batch job can cap its
        // CPU, and a one-thread run is the serial baseline of the parallel speedup (it used to borrow a
        // second core for the satellite stage and the relativity figures).
        TaskScheduler scheduler = new ConcurrentExclusiveSchedulerPair(TaskScheduler.Default, threads).ConcurrentScheduler;

        // Relativity figures (issue 4): deterministic, computed once from the scenario, alongside the
        // sampling (0.2 s on W1 that used to follow it).
        var relativityTask = Task.Factory.StartNew(
            () => Relativity.RelativityAnalysis.Build(scenario, ct), ct, TaskCreationOptions.None, scheduler);
        var kernel = new TileKernel(setup, cells, options.UseSimd, integrity);
        int batches = Math.Clamp(scenario.Batches, 1, setup.Trials);
        var sampler = new SatelliteErrorSampler(scenario, setup.Seed);
        var epochs = new EpochResult[setup.Epochs];
        var scratchPool = new ConcurrentBag<TileScratch>();
        var workPool = new ConcurrentBag<EpochWork>();
        var accumulators = new ConcurrentDictionary<int, EpochAccumulator>();
        long done = 0;
        var compaction = new HeapCompaction();
        long satelliteTicks = 0;

        var prepare = new TransformBlock<(int Epoch, int Block), EpochWork>(
            item =>
            {
                EpochWork w = workPool.TryTake(out var pooled) ? pooled : new EpochWork(scenario.TotalSatellites, setup.LaneCapacity);
                long prepareStart = StageClock.Now;
                PrepareEpoch(setup, sampler, item.Epoch, item.Block, w);
                satelliteTicks += StageClock.Now - prepareStart; // one epoch at a time: no race
                w.Accumulator = accumulators.GetOrAdd(item.Epoch, _ => new EpochAccumulator(accuracy, setup.Blocks * setup.Tiles.Count));
                w.PendingTiles = setup.Tiles.Count;
                return w;
            },
            // One epoch at a time, in order: satellite error processes (clocks) advance epoch by epoch.
            new ExecutionDataflowBlockOptions { MaxDegreeOfParallelism = 1, BoundedCapacity = 2, CancellationToken = ct, TaskScheduler = scheduler });

        // Epochs travel in small batches so a tile visits its users' cell sketches several epochs in a
        // row while they are still in cache.
        var batch = new BatchBlock<EpochWork>(
            SimulationSetup.EpochsPerBatch,
            new GroupingDataflowBlockOptions { BoundedCapacity = 2 * SimulationSetup.EpochsPerBatch, CancellationToken = ct, TaskScheduler = scheduler });

        var split = new TransformManyBlock<EpochWork[], TileJob>(
            works => setup.Tiles.Select(t => new TileJob(works, t)),
            new ExecutionDataflowBlockOptions { BoundedCapacity = 2, CancellationToken = ct, TaskScheduler = scheduler });

        var run = new ActionBlock<TileJob>(
            job =>
            {
                TileScratch scratch = scratchPool.TryTake(out var s) ? s : new TileScratch(scenario.TotalSatellites, setup.LaneCapacity, accuracy, batches)
                {
                    Integrity = integrity?.CreateScratch(setup),
                    Stages = options.MeasureStages ? new StageClock() : null,
                };
                foreach (EpochWork work in job.Batch)
                {
                    kernel.Process(work, job.Tile, scratch);
                    EpochAccumulator acc = work.Accumulator;
                    int epoch = work.Epoch;
                    lock (acc.Gate)
                    {
                        acc.Hpe.Merge(scratch.Hpe);
                        acc.Vpe.Merge(scratch.Vpe);
                        acc.Pdop.Merge(scratch.Pdop);
                        acc.WeightSum += scratch.WeightSum;
                        acc.UnavailableWeight += scratch.UnavailableWeight;
                        acc.SatsInViewWeighted += scratch.SatsInViewWeighted;
                        acc.Samples += scratch.Samples;
                    }

                    // The work item goes back to the pool only after its last tile: nothing reads it after that.
                    if (Interlocked.Decrement(ref work.PendingTiles) == 0)
                    {
                        workPool.Add(work);
                    }

                    if (acc.CompleteOne())
                    {
                        epochs[epoch] = FinishEpoch(setup, epoch, acc);
                        accumulators.TryRemove(epoch, out _);
                        compaction.AfterEpoch();
                    }

                    options.Progress?.Invoke(Interlocked.Increment(ref done), setup.TotalJobs);
                }

                scratchPool.Add(scratch);
            },
            // One job per task: a worker gives its slot back after each job, so the satellite stage gets
            // its turn in the shared scheduler's queue instead of waiting for the workers to run dry.
            new ExecutionDataflowBlockOptions
            {
                MaxDegreeOfParallelism = threads, BoundedCapacity = threads * 2, MaxMessagesPerTask = 1, CancellationToken = ct, TaskScheduler = scheduler,
            });

        var link = new DataflowLinkOptions { PropagateCompletion = true };
        prepare.LinkTo(batch, link);
        batch.LinkTo(split, link);
        split.LinkTo(run, link);

        // Trial blocks outside, epochs inside: a block's satellite error states run through the whole
        // day before the next block starts, so memory holds one block of states at a time.
        for (int b = 0; b < setup.Blocks; b++)
        {
            for (int e = 0; e < setup.Epochs; e++)
            {
                if (!await prepare.SendAsync((e, b), ct).ConfigureAwait(false))
                {
                    break;
                }
            }
        }

        prepare.Complete();
        try
        {
            await run.Completion.ConfigureAwait(false);
        }
        catch (TaskCanceledException) when (ct.IsCancellationRequested)
        {
            ct.ThrowIfCancellationRequested();
        }

        ct.ThrowIfCancellationRequested();
        clock.Stop();
        var cellResults = BuildCells(setup, cells);
        var global = BuildGlobal(setup, cells, cellResults);
        var metadata = new RunMetadata(
            HashOf(scenario.SourceText), setup.Seed, setup.Trials, options.ToolVersion, threads, started, clock.Elapsed.TotalSeconds);
        var relativity = await relativityTask.ConfigureAwait(false);
        var scratches = scratchPool.ToArray();
        return new RunResult(scenario, metadata, cellResults, epochs, global)
        {
            Integrity = integrity is null ? null : IntegrityAssembly.Build(setup, integrity, cells, scratches, cellResults),
            Intervals = batches < 2 ? null : BatchIntervalAssembly.Build(scratches, batches),
            Stages = options.MeasureStages ? Stages(scratches, satelliteTicks) : null,
            Relativity = relativity,
            // Clock grades (issue 3): the grade's model vs simulated ADEV, and the sampler's age-of-data statistics.
            Clocks = MeasureClockGrade(scenario, setup),
            AgeOfData = sampler.AgeOfDataRows(),
        };
    }

    /// <summary>Issue 3: the clocks.parquet rows of the scenario's grade (none for the simple clock model).</summary>
    private static IReadOnlyList<ClockAdevRow> MeasureClockGrade(Scenario scenario, SimulationSetup setup) =>
        scenario.Clock.Grade is { } grade
            ? SimulatedAllanDeviation.Measure(grade, GradedClockModel.CreateSimulator(scenario), setup.Seed, setup.Epochs)
            : [];

    private static StageTimes Stages(IEnumerable<TileScratch> scratches, long satelliteTicks)
    {
        var sum = new StageClock();
        foreach (var s in scratches)
        {
            sum.Add(s.Stages!);
        }

        double f = 1.0 / Stopwatch.Frequency;
        return new StageTimes(satelliteTicks * f, sum.Geometry * f, sum.UserNormals * f, sum.Projection * f, sum.Sketches * f, sum.Integrity * f);
    }

    /// <summary>SHA-256 of the scenario text, lower-case hex: the identity of a scenario in every output.</summary>
    public static string HashOf(string text) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));

    private static void PrepareEpoch(SimulationSetup setup, SatelliteErrorSampler sampler, int epoch, int block, EpochWork w)
    {
        double t = setup.Scenario.Run.EpochTimeSeconds(epoch);
        w.Epoch = epoch;
        w.TimeSeconds = t;
        w.RotationAngleRad = setup.StartRotationAngleRad + Wgs84.EarthRotationRateRadPerSecond * t;
        w.FirstTrial = block * setup.BlockCapacity;
        w.BlockTrials = Math.Min(setup.BlockCapacity, setup.Trials - w.FirstTrial);
        w.IsFirstBlock = block == 0;
        setup.Constellation.Propagate(t, setup.StartRotationAngleRad, w.States);
        w.FillPositions();
        sampler.Sample(epoch, t, w.RotationAngleRad, w.States, w.FirstTrial, w.BlockTrials, setup.LaneCapacity, w.SatelliteErrors, w.Faulted);
        w.FillSingle(setup.LaneCapacity, w.BlockTrials);
    }

    private static EpochResult FinishEpoch(SimulationSetup setup, int epoch, EpochAccumulator acc)
    {
        double t = setup.Scenario.Run.EpochTimeSeconds(epoch);
        double total = Math.Max(1, acc.WeightSum);
        return new EpochResult(
            epoch,
            t,
            setup.Scenario.Run.StartUtc.AddSeconds(t),
            acc.Samples,
            acc.UnavailableWeight / total,
            acc.SatsInViewWeighted / total,
            acc.Pdop.IsEmpty ? double.NaN : acc.Pdop.Quantile(0.50),
            acc.Pdop.IsEmpty ? double.NaN : acc.Pdop.Quantile(0.95),
            PercentileReport.From(acc.Hpe, acc.Samples),
            PercentileReport.From(acc.Vpe, acc.Samples));
    }

    private static CellResult[] BuildCells(SimulationSetup setup, CellAccumulator[] cells)
    {
        var rows = new CellResult[cells.Length];
        for (int i = 0; i < cells.Length; i++)
        {
            var a = cells[i];
            var g = setup.Grid.Cells[i];
            long available = a.Epochs - a.UnavailableEpochs;
            rows[i] = new CellResult(
                i,
                g.LatDeg,
                g.LonDeg,
                g.AreaWeight,
                a.Samples,
                a.Epochs == 0 ? double.NaN : (double)a.UnavailableEpochs / a.Epochs,
                a.Epochs == 0 ? double.NaN : (double)a.SatsInViewSum / a.Epochs,
                PercentileReport.Percentile(a.Pdop, available, 0.50),
                PercentileReport.Percentile(a.Pdop, available, 0.95),
                PercentileReport.Percentile(a.Hdop, available, 0.95),
                PercentileReport.Percentile(a.Vdop, available, 0.95),
                PercentileReport.From(a.Hpe, a.Samples),
                PercentileReport.From(a.Vpe, a.Samples));
        }

        return rows;
    }

    private static GlobalFigures BuildGlobal(SimulationSetup setup, CellAccumulator[] cells, CellResult[] rows)
    {
        var hpe = new DDSketch(SimulationSetup.SketchAccuracy);
        var vpe = new DDSketch(SimulationSetup.SketchAccuracy);
        long samples = 0;
        double unavailable = 0;
        for (int i = 0; i < cells.Length; i++)
        {
            long w = setup.Weights.Integer[i];
            hpe.Merge(cells[i].Hpe, w);
            vpe.Merge(cells[i].Vpe, w);
            samples += cells[i].Samples;
            unavailable += setup.Grid.Cells[i].AreaWeight * (double.IsNaN(rows[i].UnavailableFraction) ? 1.0 : rows[i].UnavailableFraction);
        }

        return new GlobalFigures(
            samples,
            unavailable,
            PercentileReport.From(hpe, samples),
            PercentileReport.From(vpe, samples),
            Worst(rows, r => r.Hpe.P95),
            Worst(rows, r => r.Vpe.P95));
    }

    private static WorstCell Worst(CellResult[] rows, Func<CellResult, double> p95)
    {
        CellResult? worst = null;
        foreach (var r in rows)
        {
            double v = p95(r);
            if (!double.IsNaN(v) && (worst is null || v > p95(worst)))
            {
                worst = r;
            }
        }

        return worst is null
            ? new WorstCell(-1, double.NaN, double.NaN, double.NaN)
            : new WorstCell(worst.CellIndex, worst.LatDeg, worst.LonDeg, p95(worst));
    }
}

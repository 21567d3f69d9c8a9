using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>Turns the workers' per-batch area-weighted sketches into batch-means intervals of the global percentiles.</summary>
internal static class BatchIntervalAssembly
{
    public static BatchIntervals Build(IReadOnlyList<TileScratch> scratches, int batches)
    {
        var hpe = new DDSketch[batches];
        var vpe = new DDSketch[batches];
        for (int b = 0; b < batches; b++)
        {
            hpe[b] = new DDSketch(SimulationSetup.SketchAccuracy);
            vpe[b] = new DDSketch(SimulationSetup.SketchAccuracy);
            foreach (var s in scratches)
            {
                s.HpeRun.AddBatchTo(b, hpe[b]);
                s.VpeRun.AddBatchTo(b, vpe[b]);
            }
        }

        return new BatchIntervals(batches, Intervals(hpe), Intervals(vpe));
    }

    private static PercentileInterval[] Intervals(DDSketch[] perBatch)
    {
        var result = new PercentileInterval[PercentileSet.Levels.Length];
        Span<double> estimates = stackalloc double[perBatch.Length];
        for (int k = 0; k < result.Length; k++)
        {
            double level = PercentileSet.Levels[k];
            bool complete = true;
            for (int b = 0; b < perBatch.Length; b++)
            {
                estimates[b] = perBatch[b].IsEmpty ? double.NaN : perBatch[b].Quantile(level);
                complete &= double.IsFinite(estimates[b]);
            }

            if (!complete)
            {
                result[k] = new PercentileInterval(level, double.NaN, double.NaN, double.NaN);
                continue;
            }

            BatchMeansEstimate e = BatchMeansInterval.Compute(estimates, BatchIntervals.Confidence);
            // Each batch estimate is a sketch bucket's value, within the sketch's relative accuracy alpha of
            // the batch's exact percentile; batches often share a bucket, which alone would give a zero
            // spread. The interval is widened by alpha on each side to cover that quantisation.
            double alpha = SimulationSetup.SketchAccuracy;
            result[k] = new PercentileInterval(level, e.Mean, e.Lower * (1 - alpha), e.Upper * (1 + alpha));
        }

        return result;
    }
}

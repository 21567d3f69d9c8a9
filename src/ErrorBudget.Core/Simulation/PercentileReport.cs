using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>Turns a sketch into the reported percentile set, withholding tails the sample count cannot support.</summary>
internal static class PercentileReport
{
    /// <summary>
    /// A q-percentile is reported only when at least 1 / (1 - q) samples stand behind the sketch,
    /// i.e. at least one sample is expected beyond it; otherwise it is NaN (written as null).
    /// </summary>
    public static double Percentile(DDSketch sketch, long samples, double q)
    {
        if (samples <= 0 || sketch.IsEmpty || samples * (1.0 - q) < 1.0 - 1e-9)
        {
            return double.NaN;
        }

        return sketch.Quantile(q);
    }

    public static PercentileSet From(DDSketch sketch, long samples) => new(
        Percentile(sketch, samples, 0.50),
        Percentile(sketch, samples, 0.95),
        Percentile(sketch, samples, 0.99),
        Percentile(sketch, samples, 0.999));
}

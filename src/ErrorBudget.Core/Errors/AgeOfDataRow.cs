namespace ErrorBudget.Core.Errors;

/// <summary>
/// Satellite-level range errors of one age-of-data bin, pooled over satellites, epochs and trials.
/// NaN marks a figure the bin's samples cannot support (no samples; a p95 needs at least 20).
/// </summary>
/// <param name="BinIndex">Bin number from 0 (youngest data).</param>
/// <param name="AgeMinSeconds">Lower edge of the bin (inclusive), s.</param>
/// <param name="AgeMaxSeconds">Upper edge of the bin (exclusive; the last bin includes it), s.</param>
/// <param name="AgeMeanSeconds">Mean age of data of the samples in the bin, s.</param>
/// <param name="Samples">Satellite-epoch-trial samples in the bin.</param>
/// <param name="ClockRangeRmsMeters">rms of the clock range error (component 3 of the sampler), m.</param>
/// <param name="ClockRangeP95Meters">95th percentile of |clock range error|, m.</param>
/// <param name="ClockRangeModelRmsMeters">The same rms from the closed form at each sample's age (see <see cref="GradedClockModel.RangeMeanSquare"/>), m.</param>
/// <param name="OrbitRangeRmsMeters">rms of the orbit-only URE sqrt((0.98 r)^2 + (a^2 + c^2)/49), m.</param>
/// <param name="OrbitRangeP95Meters">95th percentile of the orbit-only URE, m.</param>
public sealed record AgeOfDataRow(
    int BinIndex,
    double AgeMinSeconds,
    double AgeMaxSeconds,
    double AgeMeanSeconds,
    long Samples,
    double ClockRangeRmsMeters,
    double ClockRangeP95Meters,
    double ClockRangeModelRmsMeters,
    double OrbitRangeRmsMeters,
    double OrbitRangeP95Meters);

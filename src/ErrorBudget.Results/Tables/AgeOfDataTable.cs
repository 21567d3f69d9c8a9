using ErrorBudget.Core.Errors;

namespace ErrorBudget.Results.Tables;

/// <summary>age_of_data.parquet: satellite-level clock and orbit range errors by age-of-data bin.</summary>
internal static class AgeOfDataTable
{
    private const string Tail = " Null when the bin has no samples.";
    private const string P95Tail = " Null when the bin has fewer than 20 samples.";

    public static TableDefinition<AgeOfDataRow> Definition { get; } = new(
        name: "age_of_data",
        fileName: ResultSetLayout.AgeOfDataFileName,
        title: "Satellite range errors by age of data",
        description: "One row per age-of-data bin (24 equal bins from 0 to the largest age the upload schedule allows): "
            + "the clock range error and the orbit-only range error of every satellite, epoch and trial whose broadcast "
            + "clock was that old, with the clock model's closed-form rms beside the simulated one.",
        primaryKey: "bin_index",
        columns:
        [
            new Int32Column<AgeOfDataRow>("bin_index", "1", "Bin number from 0 (youngest data).", r => r.BinIndex, minimum: 0),
            new DoubleColumn<AgeOfDataRow>("age_min_s", false, "s", "Lower edge of the bin (inclusive): time since the satellite's latest upload.", r => r.AgeMinSeconds, minimum: 0),
            new DoubleColumn<AgeOfDataRow>("age_max_s", false, "s", "Upper edge of the bin (exclusive; the last bin includes it).", r => r.AgeMaxSeconds, minimum: 0),
            new DoubleColumn<AgeOfDataRow>("age_mean_s", true, "s", "Mean age of data of the bin's samples." + Tail, r => r.AgeMeanSeconds, minimum: 0),
            new Int64Column<AgeOfDataRow>("samples", "1", "Satellite-epoch-trial samples in the bin.", r => r.Samples, minimum: 0),
            new DoubleColumn<AgeOfDataRow>("clock_range_rms_m", true, "m", "rms of the satellite clock range error (-c x phase error of the broadcast clock)." + Tail, r => r.ClockRangeRmsMeters, minimum: 0),
            new DoubleColumn<AgeOfDataRow>("clock_range_p95_m", true, "m", "95th percentile of |clock range error| (DDSketch, 0.5 % relative accuracy)." + P95Tail, r => r.ClockRangeP95Meters, minimum: 0),
            new DoubleColumn<AgeOfDataRow>("clock_range_model_rms_m", true, "m", "rms the clock model predicts for the same samples: simple model sqrt(upload^2 + (growth x age)^2); graded model c x sqrt(two-state prediction-error variance with band limit f_h = 1 / (2 step) + estimation errors + drift^2), averaged over the samples' ages." + Tail, r => r.ClockRangeModelRmsMeters, minimum: 0),
            new DoubleColumn<AgeOfDataRow>("orbit_range_rms_m", true, "m", "rms of the orbit-only URE sqrt((0.98 radial)^2 + (along^2 + cross^2) / 49), the usual weights at GPS altitude (common practice), for every shell." + Tail, r => r.OrbitRangeRmsMeters, minimum: 0),
            new DoubleColumn<AgeOfDataRow>("orbit_range_p95_m", true, "m", "95th percentile of the orbit-only URE (DDSketch, 0.5 % relative accuracy)." + P95Tail, r => r.OrbitRangeP95Meters, minimum: 0),
        ]);
}

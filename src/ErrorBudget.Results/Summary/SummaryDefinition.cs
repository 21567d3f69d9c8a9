using ErrorBudget.Core.Simulation;
using ErrorBudget.Results.Tables;

namespace ErrorBudget.Results.Summary;

/// <summary>The members of summary.json, in file order.</summary>
internal static class SummaryDefinition
{
    /// <summary>Schema document name (results-schema/summary.schema.json).</summary>
    public const string Name = "summary";

    public const string Title = "Run summary";

    public const string Description =
        "Provenance and service-area figures of one run (summary.json). This document is a JSON Schema "
        + "(draft 2020-12) rather than a Table Schema because the summary is one nested JSON object, not a table. "
        + "Missing figures (too few samples) are null; numbers use '.' decimals whatever the locale.";

    public static IReadOnlyList<SummaryField> Fields { get; } =
    [
        new SummaryInteger("schema_version", "Version of the result set layout and schema documents.", "1", _ => ResultSetLayout.SchemaVersion, 1),
        new SummaryString("tool_version", "Informational version of the tool that wrote the result set.", null, r => r.Metadata.ToolVersion),
        new SummaryString("scenario_name", "File name the scenario came from.", null, r => r.Scenario.SourceName),
        new SummaryString("scenario_hash", "SHA-256 of the scenario text, lower-case hex.", null, r => r.Metadata.ScenarioHash),
        new SummaryUnsignedInteger("seed", "Master seed actually used (scenario or --seed).", "1", r => r.Metadata.Seed),
        new SummaryInteger("trials", "Monte Carlo trials actually run (with method \"exact\": the trials the samples columns stand for).", "1", r => r.Metadata.Trials, 1),
        new SummaryString("method", "\"monte-carlo\" (sampled), or \"exact\" (percentiles of the Gaussian position-error mixtures, run --exact).", null, r => r.Exact ? "exact" : "monte-carlo"),
        new SummaryInteger("threads", "Worker threads used (does not change any result).", "1", r => r.Metadata.Threads, 1),
        new SummaryString("started_utc", "Wall-clock start of the run, ISO 8601 UTC to the second.", "date-time", r => EpochsTable.FormatUtc(r.Metadata.StartedUtc)),
        new SummaryNumber("run_seconds", "Wall-clock duration of the simulation.", "s", false, r => r.Metadata.RunSeconds, Minimum: 0),
        new SummaryInteger("epochs", "Rows of epochs.parquet (simulated epochs).", "1", r => r.Epochs.Count, 0),
        new SummaryInteger("cells", "Rows of cells.parquet (grid cells).", "1", r => r.Cells.Count, 0),
        new SummaryInteger("satellites", "Satellites in the constellation, all shells.", "1", r => r.Scenario.TotalSatellites, 0),
        new SummaryInteger("samples", "Samples behind the service-area figures.", "1", r => r.Global.Samples, 0),
        new SummaryNumber("unavailable_fraction", "Area-weighted fraction of samples without a position solution; null when there are no samples.", "1", true, r => r.Global.UnavailableFraction, 0, 1),
        Percentiles("hpe", "Horizontal position error (HPE = sqrt(dE^2 + dN^2)) percentiles of the area-weighted pooled distribution of all samples.", r => r.Global.Hpe),
        Percentiles("vpe", "Vertical position error (VPE = |dU|) percentiles of the area-weighted pooled distribution of all samples.", r => r.Global.Vpe),
        Worst("worst_cell_hpe", "The cell with the largest 95th percentile of HPE.", r => r.Global.WorstHpe),
        Worst("worst_cell_vpe", "The cell with the largest 95th percentile of VPE.", r => r.Global.WorstVpe),
        RelativityPosition(),
        new SummaryInteger("batches", "Independent trial batches behind the confidence intervals (1: none).", "1", r => r.Intervals?.Batches ?? 1, 1),
        Intervals("hpe_ci", "95 % batch-means confidence intervals of the global HPE percentiles; nulls with fewer than 2 batches.", r => r.Intervals?.Hpe),
        Intervals("vpe_ci", "95 % batch-means confidence intervals of the global VPE percentiles; nulls with fewer than 2 batches.", r => r.Intervals?.Vpe),
        IntegritySummary.Object(),
        new SummaryString("caution", "How far these results may be relied on.", null, _ => ResultCaution.Text),
    ];

    private static SummaryObject Intervals(string name, string description, Func<RunResult, IReadOnlyList<PercentileInterval>?> get)
    {
        SummaryNumber Bound(string field, string text, int level, Func<PercentileInterval, double> pick) =>
            new(field, text, "m", true, r => get(r) is { } list ? pick(list[level]) : double.NaN, Minimum: 0);
        return new SummaryObject(name, description,
        [
            Bound("p50_lower_m", "Lower bound of the median.", 0, i => i.Lower),
            Bound("p50_upper_m", "Upper bound of the median.", 0, i => i.Upper),
            Bound("p95_lower_m", "Lower bound of the 95th percentile.", 1, i => i.Lower),
            Bound("p95_upper_m", "Upper bound of the 95th percentile.", 1, i => i.Upper),
            Bound("p99_lower_m", "Lower bound of the 99th percentile.", 2, i => i.Lower),
            Bound("p99_upper_m", "Upper bound of the 99th percentile.", 2, i => i.Upper),
            Bound("p999_lower_m", "Lower bound of the 99.9th percentile (wide with few trials per batch).", 3, i => i.Lower),
            Bound("p999_upper_m", "Upper bound of the 99.9th percentile.", 3, i => i.Upper),
        ]);
    }

    private static SummaryObject RelativityPosition() =>
        new("relativity_position",
            "Position error caused by the missed or mis-set relativistic terms alone (all of them together, no other error) "
            + "at sampled (user, epoch) pairs; zero when every term is applied. Per-satellite range figures are in relativity.parquet.",
        [
            new SummaryInteger("user_epochs", "Sampled (user, epoch) pairs with a solution behind these figures.", "1", r => r.Relativity.Position.UserEpochs, 0),
            new SummaryNumber("hpe_rms_m", "RMS of the HPE the terms cause; null when no pair was sampled.", "m", true, r => r.Relativity.Position.Hpe.Rms, Minimum: 0),
            new SummaryNumber("hpe_max_m", "Largest HPE the terms cause; null when no pair was sampled.", "m", true, r => r.Relativity.Position.Hpe.MaxAbs, Minimum: 0),
            new SummaryNumber("vpe_rms_m", "RMS of the VPE the terms cause; null when no pair was sampled.", "m", true, r => r.Relativity.Position.Vpe.Rms, Minimum: 0),
            new SummaryNumber("vpe_max_m", "Largest VPE the terms cause; null when no pair was sampled.", "m", true, r => r.Relativity.Position.Vpe.MaxAbs, Minimum: 0),
            new SummaryNumber("receiver_clock_rms_m", "RMS of the receiver-clock error the terms cause (where a common range error goes); null when no pair was sampled.", "m", true, r => r.Relativity.Position.ReceiverClock.Rms, Minimum: 0),
        ]);

    private static SummaryObject Percentiles(string name, string description, Func<RunResult, PercentileSet> get)
    {
        const string tail = "; null where too few samples stand behind the level.";
        return new SummaryObject(name, description,
        [
            new SummaryNumber("p50_m", "Median" + tail, "m", true, r => get(r).P50, Minimum: 0),
            new SummaryNumber("p95_m", "95th percentile" + tail, "m", true, r => get(r).P95, Minimum: 0),
            new SummaryNumber("p99_m", "99th percentile" + tail, "m", true, r => get(r).P99, Minimum: 0),
            new SummaryNumber("p999_m", "99.9th percentile" + tail, "m", true, r => get(r).P999, Minimum: 0),
        ]);
    }

    private static SummaryObject Worst(string name, string description, Func<RunResult, WorstCell> get) =>
        new(name, description + " Index -1 and null position when no cell has samples.",
        [
            new SummaryInteger("cell_index", "Row cell_index in cells.parquet, or -1 when no cell has samples.", "1", r => get(r).CellIndex, -1),
            new SummaryNumber("lat_deg", "Latitude of the cell centre; null when there is no such cell.", "deg", true, r => get(r).LatDeg, -90, 90),
            new SummaryNumber("lon_deg", "Longitude of the cell centre, east positive; null when there is no such cell.", "deg", true, r => get(r).LonDeg, -180, 360),
            new SummaryNumber("p95_m", "The cell's 95th percentile; null when there is no such cell.", "m", true, r => get(r).P95Meters, Minimum: 0),
        ]);
}

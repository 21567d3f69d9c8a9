using System.Globalization;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Tables;

/// <summary>epochs.parquet: one row per epoch, service-area figures pooled over cells and trials.</summary>
internal static class EpochsTable
{
    /// <summary>ISO 8601 UTC to the second, e.g. 2031-06-01T00:05:00Z.</summary>
    public const string UtcFormat = "yyyy-MM-dd'T'HH:mm:ss'Z'";

    private const string Scope = "over the service area at the epoch (area-weighted, pooled over trials)";

    public static TableDefinition<EpochResult> Definition { get; } = new(
        name: "epochs",
        fileName: ResultSetLayout.EpochsFileName,
        title: "Per-epoch service-area figures",
        description: "One row per simulated epoch: availability, geometry and position-error percentiles over the "
            + "service area, area-weighted over the cells and pooled over the Monte Carlo trials.",
        primaryKey: "epoch_index",
        columns:
        [
            new Int32Column<EpochResult>("epoch_index", "1", "Index of the epoch, starting at 0.", e => e.EpochIndex, minimum: 0),
            new DoubleColumn<EpochResult>("time_s", false, "s", "Time of the epoch since the scenario start.", e => e.TimeSeconds, minimum: 0),
            new StringColumn<EpochResult>("utc", null, "UTC instant of the epoch, ISO 8601 to the second (yyyy-MM-ddTHH:mm:ssZ).", e => FormatUtc(e.Utc)),
            new Int64Column<EpochResult>("samples", "1", "Cell-trial samples pooled at the epoch.", e => e.Samples, minimum: 0),
            new DoubleColumn<EpochResult>("unavailable_fraction", true, "1", "Area-weighted fraction of samples without a position solution. Null when there are no samples.", e => e.UnavailableFraction, minimum: 0, maximum: 1),
            new DoubleColumn<EpochResult>("sats_in_view_mean", true, "1", "Area-weighted mean number of satellites above the elevation mask. Null when there are no samples.", e => e.SatsInViewMean, minimum: 0),
            new DoubleColumn<EpochResult>("pdop_p50", true, "1", "Median position dilution of precision over the service area. Null when there is no solution.", e => e.PdopP50, minimum: 0),
            new DoubleColumn<EpochResult>("pdop_p95", true, "1", "95th percentile of the position dilution of precision over the service area. Null when the samples cannot support it.", e => e.PdopP95, minimum: 0),
            .. PercentileColumns.For<EpochResult>("hpe", "horizontal position error (HPE = sqrt(dE^2 + dN^2))", Scope, e => e.Hpe),
            .. PercentileColumns.For<EpochResult>("vpe", "vertical position error (VPE = |dU|)", Scope, e => e.Vpe),
        ]);

    /// <summary>Formats an instant as <see cref="UtcFormat"/> (converted to UTC first, invariant culture).</summary>
    public static string FormatUtc(DateTimeOffset instant) =>
        instant.UtcDateTime.ToString(UtcFormat, CultureInfo.InvariantCulture);
}

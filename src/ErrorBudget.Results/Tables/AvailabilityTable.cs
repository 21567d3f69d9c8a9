using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Tables;

/// <summary>
/// availability.parquet (issue 5): one row per grid cell, the protection levels, availability and
/// integrity events under [integrity]; no rows when the scenario has no [integrity] table.
/// </summary>
internal static class AvailabilityTable
{
    private const string Counted = "Counted over every trial at the cell's epochs with a position solution.";

    public static TableDefinition<IntegrityCellRow> Definition { get; } = new(
        name: "availability",
        fileName: ResultSetLayout.AvailabilityFileName,
        title: "Per-cell availability and integrity events",
        description: "One row per grid cell when the scenario has [integrity]: protection-level percentiles over the epochs, "
            + "availability (PL <= AL on every axis of the service), and counts of misleading information (error > PL) and "
            + "hazardously misleading information (error > AL while the service is declared available). Rates and their "
            + "Clopper-Pearson bounds over the whole area are in summary.json.",
        primaryKey: "cell_index",
        columns:
        [
            new Int32Column<IntegrityCellRow>("cell_index", "1", "Row cell_index of cells.parquet.", r => r.CellIndex, minimum: 0),
            new DoubleColumn<IntegrityCellRow>("lat_deg", false, "deg", "Latitude of the cell centre (geodetic, WGS-84).", r => r.LatDeg, -90, 90),
            new DoubleColumn<IntegrityCellRow>("lon_deg", false, "deg", "Longitude of the cell centre, east positive.", r => r.LonDeg, -180, 360),
            new DoubleColumn<IntegrityCellRow>("area_weight", false, "1", "The cell's share of the service area's surface.", r => r.AreaWeight, 0, 1),
            new Int64Column<IntegrityCellRow>("epochs", "1", "Epochs simulated at the cell.", r => r.Epochs, minimum: 0),
            new DoubleColumn<IntegrityCellRow>("availability", true, "1", "Share of epochs with a solution and PL <= AL on every axis the service has; null without epochs.", r => r.Availability, 0, 1),
            new DoubleColumn<IntegrityCellRow>("hpl_p50_m", true, "m", "Median HPL over the epochs with a solution; null when there is none.", r => r.HplP50, minimum: 0),
            new DoubleColumn<IntegrityCellRow>("hpl_p95_m", true, "m", "95th percentile of HPL over the epochs with a solution; null with fewer than 20.", r => r.HplP95, minimum: 0),
            new DoubleColumn<IntegrityCellRow>("vpl_p50_m", true, "m", "Median VPL over the epochs with a solution; null when there is none.", r => r.VplP50, minimum: 0),
            new DoubleColumn<IntegrityCellRow>("vpl_p95_m", true, "m", "95th percentile of VPL over the epochs with a solution; null with fewer than 20.", r => r.VplP95, minimum: 0),
            new Int64Column<IntegrityCellRow>("samples", "1", "Position-error samples compared with the protection levels (epochs with a solution x trials).", r => r.Samples, minimum: 0),
            new Int64Column<IntegrityCellRow>("available_samples", "1", "Samples at available epochs (and, with ARAIM, not flagged by the monitor).", r => r.AvailableSamples, minimum: 0),
            new Int64Column<IntegrityCellRow>("mi_horizontal", "1", "Misleading information, horizontal: HPE > HPL. " + Counted, r => r.MisleadingHorizontal, minimum: 0),
            new Int64Column<IntegrityCellRow>("mi_vertical", "1", "Misleading information, vertical: VPE > VPL. " + Counted, r => r.MisleadingVertical, minimum: 0),
            new Int64Column<IntegrityCellRow>("hmi_horizontal", "1", "Hazardously misleading information, horizontal: HPE > HAL among the available samples.", r => r.HazardousHorizontal, minimum: 0),
            new Int64Column<IntegrityCellRow>("hmi_vertical", "1", "Hazardously misleading information, vertical: VPE > VAL among the available samples (0 for a service with no VAL).", r => r.HazardousVertical, minimum: 0),
            new DoubleColumn<IntegrityCellRow>("mi_horizontal_rate_upper", true, "1", "95 % Clopper-Pearson upper bound of mi_horizontal / samples; null without samples.", r => r.MisleadingHorizontalUpper, 0, 1),
            new DoubleColumn<IntegrityCellRow>("mi_vertical_rate_upper", true, "1", "95 % Clopper-Pearson upper bound of mi_vertical / samples; null without samples.", r => r.MisleadingVerticalUpper, 0, 1),
            new DoubleColumn<IntegrityCellRow>("hmi_horizontal_rate_upper", true, "1", "95 % Clopper-Pearson upper bound of hmi_horizontal / available_samples; null without available samples.", r => r.HazardousHorizontalUpper, 0, 1),
            new DoubleColumn<IntegrityCellRow>("hmi_vertical_rate_upper", true, "1", "95 % Clopper-Pearson upper bound of hmi_vertical / available_samples; null without available samples.", r => r.HazardousVerticalUpper, 0, 1),
            new Int64Column<IntegrityCellRow>("detections", "1", "ARAIM: samples where a solution-separation test exceeded its threshold (0 with weighted PLs).", r => r.Detections, minimum: 0),
            new Int64Column<IntegrityCellRow>("exclusions", "1", "ARAIM: detections followed by a successful exclusion.", r => r.Exclusions, minimum: 0),
            new Int64Column<IntegrityCellRow>("faulted_samples", "1", "Samples with an injected [faults] fault on a satellite in view.", r => r.FaultedSamples, minimum: 0),
            new Int64Column<IntegrityCellRow>("missed_detections", "1", "ARAIM: faulted samples without a detection.", r => r.MissedDetections, minimum: 0),
        ]);
}

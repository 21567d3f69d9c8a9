using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Tables;

/// <summary>cells.parquet: one row per grid cell, figures over all epochs and trials.</summary>
internal static class CellsTable
{
    private const string Scope = "at the cell over all epochs and trials";

    public static TableDefinition<CellResult> Definition { get; } = new(
        name: "cells",
        fileName: ResultSetLayout.CellsFileName,
        title: "Per-cell figures",
        description: "One row per grid cell (one user at the cell centre): availability, geometry and position-error "
            + "percentiles over all epochs and Monte Carlo trials.",
        primaryKey: "cell_index",
        columns:
        [
            new Int32Column<CellResult>("cell_index", "1", "Row-major index of the cell: row (south to north) times the number of columns plus column (west to east), from 0.", c => c.CellIndex, minimum: 0),
            new DoubleColumn<CellResult>("lat_deg", false, "deg", "Geodetic latitude of the cell centre (WGS-84).", c => c.LatDeg, minimum: -90, maximum: 90),
            new DoubleColumn<CellResult>("lon_deg", false, "deg", "Longitude of the cell centre, east positive (WGS-84).", c => c.LonDeg, minimum: -180, maximum: 360),
            new DoubleColumn<CellResult>("area_weight", false, "1", "Share of the service area's surface, (sin lat_north - sin lat_south) x delta_lon normalised to sum 1; weighs the cell in the service-area figures.", c => c.AreaWeight, minimum: 0),
            new Int64Column<CellResult>("samples", "1", "Position-error samples behind the cell's percentiles: available epochs x trials.", c => c.Samples, minimum: 0),
            new DoubleColumn<CellResult>("unavailable_fraction", true, "1", "Fraction of the cell's samples without a position solution. Null when there are no samples.", c => c.UnavailableFraction, minimum: 0, maximum: 1),
            new DoubleColumn<CellResult>("sats_in_view_mean", true, "1", "Mean number of satellites above the elevation mask. Null when there are no samples.", c => c.SatsInViewMean, minimum: 0),
            new DoubleColumn<CellResult>("pdop_p50", true, "1", "Median position dilution of precision over the epochs with a solution. Null when there is none.", c => c.PdopP50, minimum: 0),
            new DoubleColumn<CellResult>("pdop_p95", true, "1", "95th percentile of the position dilution of precision. Null when the samples cannot support it.", c => c.PdopP95, minimum: 0),
            new DoubleColumn<CellResult>("hdop_p95", true, "1", "95th percentile of the horizontal dilution of precision. Null when the samples cannot support it.", c => c.HdopP95, minimum: 0),
            new DoubleColumn<CellResult>("vdop_p95", true, "1", "95th percentile of the vertical dilution of precision. Null when the samples cannot support it.", c => c.VdopP95, minimum: 0),
            .. PercentileColumns.For<CellResult>("hpe", "horizontal position error (HPE = sqrt(dE^2 + dN^2))", Scope, c => c.Hpe),
            .. PercentileColumns.For<CellResult>("vpe", "vertical position error (VPE = |dU|)", Scope, c => c.Vpe),
        ]);
}

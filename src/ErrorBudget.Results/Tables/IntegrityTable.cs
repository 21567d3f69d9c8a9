using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Tables;

/// <summary>
/// integrity.parquet (issue 5): the integrity diagram, a 2-D histogram of (protection level, position
/// error) over all samples, horizontal and vertical; no rows without [integrity].
/// </summary>
internal static class IntegrityTable
{
    public static TableDefinition<IntegrityDiagramRow> Definition { get; } = new(
        name: "integrity",
        fileName: ResultSetLayout.IntegrityFileName,
        title: "Integrity diagram",
        description: "Non-empty cells of the 2-D histogram of (protection level, position error) over every sample, for the "
            + "horizontal (HPL, HPE) and vertical (VPL, VPE) axes. Bins are logarithmic, 20 per decade from 0.01 m to 10 km, plus "
            + "an underflow bin [0, 0.01) and an overflow bin [10 km, inf). Samples above the diagonal (error > PL) are misleading "
            + "information; with error > alert limit >= PL, hazardously misleading.",
        primaryKey: "axis,pl_low_m,error_low_m",
        columns:
        [
            new StringColumn<IntegrityDiagramRow>("axis", null, "\"horizontal\" or \"vertical\".", r => r.Axis),
            new DoubleColumn<IntegrityDiagramRow>("pl_low_m", false, "m", "Lower edge of the protection-level bin.", r => r.PlLowMeters, minimum: 0),
            new DoubleColumn<IntegrityDiagramRow>("pl_high_m", false, "m", "Upper edge of the protection-level bin (exclusive; infinite for the overflow bin).", r => r.PlHighMeters, minimum: 0),
            new DoubleColumn<IntegrityDiagramRow>("error_low_m", false, "m", "Lower edge of the position-error bin.", r => r.ErrorLowMeters, minimum: 0),
            new DoubleColumn<IntegrityDiagramRow>("error_high_m", false, "m", "Upper edge of the position-error bin (exclusive; infinite for the overflow bin).", r => r.ErrorHighMeters, minimum: 0),
            new Int64Column<IntegrityDiagramRow>("count", "1", "Samples in the cell.", r => r.Count, minimum: 1),
            new DoubleColumn<IntegrityDiagramRow>("alert_limit_m", true, "m", "The axis's alert limit (HAL or VAL) of the service; null when the service has none.", r => r.AlertLimitMeters, minimum: 0),
        ]);
}

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [grid]: the service area as a regular latitude/longitude grid of cell centres, one user per
/// cell at the cell centre, and the elevation mask.
/// </summary>
/// <param name="LatStepDeg">Range: (0, 90].</param>
/// <param name="LonStepDeg">Range: (0, 360].</param>
/// <param name="LatMinDeg">Southern edge of the area. Range: [-90, 90), below LatMaxDeg.</param>
/// <param name="LatMaxDeg">Northern edge. Range: (-90, 90].</param>
/// <param name="LonMinDeg">Western edge. Range: [-180, 180).</param>
/// <param name="LonMaxDeg">Eastern edge. Range: (-180, 360], above LonMinDeg, span at most 360.</param>
/// <param name="HeightMeters">User height above the WGS-84 ellipsoid. Range: [-500, 100,000] m.</param>
/// <param name="MaskDeg">Elevation mask. Range: [0, 90).</param>
public sealed record GridSpec(
    double LatStepDeg,
    double LonStepDeg,
    double LatMinDeg,
    double LatMaxDeg,
    double LonMinDeg,
    double LonMaxDeg,
    double HeightMeters,
    double MaskDeg)
{
    public int Rows => (int)Math.Floor((LatMaxDeg - LatMinDeg) / LatStepDeg + 1e-9);
    public int Columns => (int)Math.Floor((LonMaxDeg - LonMinDeg) / LonStepDeg + 1e-9);
    public int Cells => Rows * Columns;
}

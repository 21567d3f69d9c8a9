using ErrorBudget.Core.Geodesy;

namespace ErrorBudget.Core.Grid;

/// <summary>
/// One cell of the service grid: its centre (where the cell's user stands), its share of the
/// service area, and the user's fixed local frame (computed once per run).
/// </summary>
/// <param name="Index">Row-major index: row (south to north) times columns plus column (west to east).</param>
/// <param name="LatDeg">Centre latitude, degrees.</param>
/// <param name="LonDeg">Centre longitude, degrees.</param>
/// <param name="AreaWeight">Share of the service area's surface (weights sum to 1).</param>
/// <param name="Frame">Local East-North-Up frame at the user (origin = user ECEF position).</param>
public sealed record GridCell(int Index, double LatDeg, double LonDeg, double AreaWeight, EnuFrame Frame);

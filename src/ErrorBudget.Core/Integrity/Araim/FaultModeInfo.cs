namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>One monitored fault mode k: its fault-tolerant subset and prior.</summary>
/// <param name="Kind">Satellite or constellation mode.</param>
/// <param name="Satellite">For a satellite mode, the index (in the order given to
/// <see cref="AraimSolver.TryEvaluate"/>) of the satellite removed; −1 for a constellation mode.</param>
/// <param name="ConstellationId">The caller's constellation id of the removed satellite or constellation.</param>
/// <param name="Prior">p_fault,k, the prior of the mode. Range: 0 &lt; p &lt; 1.</param>
/// <param name="SatellitesUsed">Satellites left in the subset solution. Range: ≥ 4.</param>
internal readonly record struct FaultModeInfo(
    FaultModeKind Kind, int Satellite, int ConstellationId, double Prior, int SatellitesUsed);

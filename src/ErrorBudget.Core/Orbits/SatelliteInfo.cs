namespace ErrorBudget.Core.Orbits;

/// <summary>Identity and elements of one satellite of a <see cref="Constellation"/>.</summary>
/// <param name="Index">Position in <see cref="Constellation.Satellites"/> and in state spans, from 0.</param>
/// <param name="ShellIndex">Index of the shell in the scenario, from 0.</param>
/// <param name="ShellName">Shell label from the scenario.</param>
/// <param name="Plane">Orbital plane j within the shell, 0 .. P-1.</param>
/// <param name="Slot">Slot k within the plane, 0 .. T/P - 1.</param>
/// <param name="Elements">Keplerian elements at the start (inertial RAAN; see <see cref="KeplerElements"/>).</param>
public sealed record SatelliteInfo(int Index, int ShellIndex, string ShellName, int Plane, int Slot, KeplerElements Elements);

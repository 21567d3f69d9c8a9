namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [faults]: truth faults injected into the satellite-level errors. Rates are onsets per satellite
/// (per shell for the constellation-wide fault) per hour; each fault lasts <see cref="DurationSeconds"/>
/// and its magnitude is uniform between the bounds, with a random sign (a random direction for orbit
/// faults). Present only when the scenario has the table.
/// </summary>
public sealed record FaultSpec(
    double ClockStepRatePerHour,
    double ClockStepMinMeters,
    double ClockStepMaxMeters,
    double ClockRampRatePerHour,
    double ClockRampMinMetersPerSecond,
    double ClockRampMaxMetersPerSecond,
    double OrbitRatePerHour,
    double OrbitMinMeters,
    double OrbitMaxMeters,
    double ConstellationRatePerHour,
    double DurationSeconds)
{
    /// <summary>True when any fault can occur.</summary>
    public bool IsActive => ClockStepRatePerHour > 0 || ClockRampRatePerHour > 0 || OrbitRatePerHour > 0 || ConstellationRatePerHour > 0;
}

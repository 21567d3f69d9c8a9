namespace ErrorBudget.Core.Relativity;

/// <summary>
/// One row of relativity.parquet: a satellite's relativistic clock figures and what the scenario's [relativity]
/// choices leave in its range. Offsets are fractional frequency offsets (unitless, positive: the satellite clock
/// runs fast relative to a clock on the geoid); range errors are measured minus modelled, metres.
/// </summary>
/// <param name="SatelliteIndex">Index in the constellation, from 0 (shell by shell, plane by plane).</param>
/// <param name="ShellName">Shell label.</param>
/// <param name="SemiMajorAxisMeters">a, metres.</param>
/// <param name="Eccentricity">e, unitless.</param>
/// <param name="VelocityOffset">Special-relativity part -GM/(2 a c^2), unitless (negative).</param>
/// <param name="GravitationalOffset">Gravitational part L_G - GM/(a c^2), unitless.</param>
/// <param name="NetOffset">Net secular offset L_G - 3GM/(2 a c^2), unitless.</param>
/// <param name="AppliedOffset">Offset the system applies (factory setting), unitless.</param>
/// <param name="ResidualOffset">NetOffset - AppliedOffset, unitless: the rate the clock shows.</param>
/// <param name="PeriodicAmplitudeSeconds">|F| e sqrt(a), seconds: peak of the eccentricity term.</param>
/// <param name="FrequencyOffset">Range error of the residual rate over the run's epochs (all epochs, exact).</param>
/// <param name="EccentricityTerm">Range error of the unapplied periodic term over the run's epochs.</param>
/// <param name="Sagnac">Range error of a missed Sagnac correction over sampled (user, epoch) pairs that see the satellite.</param>
/// <param name="Shapiro">Range error of a missed Shapiro delay over the same pairs.</param>
public sealed record RelativitySatelliteFigures(
    int SatelliteIndex,
    string ShellName,
    double SemiMajorAxisMeters,
    double Eccentricity,
    double VelocityOffset,
    double GravitationalOffset,
    double NetOffset,
    double AppliedOffset,
    double ResidualOffset,
    double PeriodicAmplitudeSeconds,
    ErrorStatistics FrequencyOffset,
    ErrorStatistics EccentricityTerm,
    ErrorStatistics Sagnac,
    ErrorStatistics Shapiro);

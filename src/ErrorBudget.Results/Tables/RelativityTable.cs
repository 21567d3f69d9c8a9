using ErrorBudget.Core.Relativity;

namespace ErrorBudget.Results.Tables;

/// <summary>
/// relativity.parquet: one row per satellite, its relativistic clock offsets and the range errors the scenario's
/// [relativity] choices leave (issue 4). Offsets are fractional frequency offsets relative to a clock on the geoid,
/// positive when the satellite clock runs fast; range errors are measured minus modelled.
/// </summary>
internal static class RelativityTable
{
    private const double E10 = 1e10;
    private const double NanosecondsPerSecond = 1e9;

    private const string SatelliteLevel = "over every epoch of the run (the same in every trial); 0 when the term is applied in full.";
    private const string UserLevel = "over the sampled (user, epoch) pairs that see the satellite above the mask; 0 when the term is applied; null when no sampled user sees it.";

    public static TableDefinition<RelativitySatelliteFigures> Definition { get; } = new(
        name: "relativity",
        fileName: ResultSetLayout.RelativityFileName,
        title: "Per-satellite relativistic figures",
        description: "One row per satellite: secular clock offsets (special-relativity, gravitational, net) from its orbit, "
            + "the offset the system applies and the residual, the periodic eccentricity term's amplitude, and the rms and "
            + "largest range error each relativistic term leaves under the scenario's [relativity] choices.",
        primaryKey: "satellite_index",
        columns:
        [
            new Int32Column<RelativitySatelliteFigures>("satellite_index", "1", "Index of the satellite in the constellation, from 0 (shell by shell, plane by plane, slot by slot).", r => r.SatelliteIndex, minimum: 0),
            new StringColumn<RelativitySatelliteFigures>("shell", null, "Name of the satellite's shell.", r => r.ShellName),
            new DoubleColumn<RelativitySatelliteFigures>("semi_major_axis_km", false, "km", "Semi-major axis a of the orbit.", r => r.SemiMajorAxisMeters / 1000, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("eccentricity", false, "1", "Orbit eccentricity e.", r => r.Eccentricity, minimum: 0, maximum: 1),
            new DoubleColumn<RelativitySatelliteFigures>("sr_offset_1e10", false, "1e-10", "Special-relativity (velocity) part of the secular offset, -GM/(2 a c^2), in units of 1e-10; negative.", r => r.VelocityOffset * E10, maximum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("gr_offset_1e10", false, "1e-10", "Gravitational part, L_G - GM/(a c^2), in units of 1e-10.", r => r.GravitationalOffset * E10),
            new DoubleColumn<RelativitySatelliteFigures>("net_offset_1e10", false, "1e-10", "Net secular offset L_G - 3GM/(2 a c^2), in units of 1e-10 (4.4647 for a = 26,561.75 km).", r => r.NetOffset * E10),
            new DoubleColumn<RelativitySatelliteFigures>("sr_us_per_day", false, "us/day", "Special-relativity part as time gained per day.", r => SecularRate.MicrosecondsPerDay(r.VelocityOffset), maximum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("gr_us_per_day", false, "us/day", "Gravitational part as time gained per day.", r => SecularRate.MicrosecondsPerDay(r.GravitationalOffset)),
            new DoubleColumn<RelativitySatelliteFigures>("net_us_per_day", false, "us/day", "Net offset as time gained per day (38.575 for a = 26,561.75 km).", r => SecularRate.MicrosecondsPerDay(r.NetOffset)),
            new DoubleColumn<RelativitySatelliteFigures>("net_range_drift_m_per_day", false, "m/day", "Net offset as a range drift, y c 86400: what an uncompensated clock would cost per day.", r => SecularRate.RangeMetersPerDay(r.NetOffset)),
            new DoubleColumn<RelativitySatelliteFigures>("applied_offset_1e10", false, "1e-10", "Offset the system applies (factory setting) under [relativity] frequency_offset and its factor, in units of 1e-10.", r => r.AppliedOffset * E10),
            new DoubleColumn<RelativitySatelliteFigures>("residual_offset_1e10", false, "1e-10", "Net minus applied: the rate the clock shows, in units of 1e-10.", r => r.ResidualOffset * E10),
            new DoubleColumn<RelativitySatelliteFigures>("residual_range_drift_m_per_day", false, "m/day", "Residual offset as a range drift, y c 86400 (before any ground absorption).", r => SecularRate.RangeMetersPerDay(r.ResidualOffset)),
            new DoubleColumn<RelativitySatelliteFigures>("periodic_amplitude_ns", false, "ns", "Peak of the periodic eccentricity term |F| e sqrt(a) (IS-GPS-200 F).", r => r.PeriodicAmplitudeSeconds * NanosecondsPerSecond, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("periodic_amplitude_m", false, "m", "The same peak as range, c |F| e sqrt(a).", r => r.PeriodicAmplitudeSeconds * Core.Geodesy.PhysicalConstants.SpeedOfLight, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("frequency_offset_range_rms_m", false, "m", "Rms range error of the residual frequency offset, " + SatelliteLevel, r => r.FrequencyOffset.Rms, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("frequency_offset_range_max_m", false, "m", "Largest |range error| of the residual frequency offset, " + SatelliteLevel, r => r.FrequencyOffset.MaxAbs, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("eccentricity_range_rms_m", false, "m", "Rms range error of the unapplied periodic eccentricity term, " + SatelliteLevel, r => r.EccentricityTerm.Rms, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("eccentricity_range_max_m", false, "m", "Largest |range error| of the unapplied periodic eccentricity term, " + SatelliteLevel, r => r.EccentricityTerm.MaxAbs, minimum: 0),
            new Int64Column<RelativitySatelliteFigures>("user_epoch_pairs", "1", "Sampled (user, epoch) pairs that see the satellite: the samples behind the Sagnac and Shapiro columns.", r => r.Sagnac.Count, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("sagnac_range_rms_m", true, "m", "Rms range error of a missed Sagnac (Earth-rotation) correction, " + UserLevel, r => r.Sagnac.Rms, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("sagnac_range_max_m", true, "m", "Largest |range error| of a missed Sagnac correction, " + UserLevel, r => r.Sagnac.MaxAbs, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("shapiro_range_rms_m", true, "m", "Rms range error of a missed Shapiro (gravitational path) delay, " + UserLevel, r => r.Shapiro.Rms, minimum: 0),
            new DoubleColumn<RelativitySatelliteFigures>("shapiro_range_max_m", true, "m", "Largest range error of a missed Shapiro delay, " + UserLevel, r => r.Shapiro.MaxAbs, minimum: 0),
        ]);
}

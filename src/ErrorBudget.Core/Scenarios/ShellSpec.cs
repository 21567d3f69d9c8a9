namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [[shell]]: one Walker-delta shell T/P/F (satellites / planes / phasing). Several shells make a
/// mixed constellation (MEO, IGSO, GEO). Angles in degrees as written in the scenario.
/// </summary>
/// <param name="Name">Shell label used in outputs.</param>
/// <param name="Satellites">T, total satellites of the shell. Range: 1 .. 1000.</param>
/// <param name="Planes">P, orbital planes; must divide T.</param>
/// <param name="Phasing">F, Walker phasing factor. Range: 0 .. P-1.</param>
/// <param name="InclinationDeg">Range: [0, 180].</param>
/// <param name="SemiMajorAxisMeters">Range: (6,378,137 m / (1 - e), 1e8 m].</param>
/// <param name="Eccentricity">Range: [0, 0.9].</param>
/// <param name="ArgumentOfPerigeeDeg">Range: [-360, 360].</param>
/// <param name="RaanOffsetDeg">Right ascension of the first plane at the start. Range: [-360, 360].</param>
/// <param name="MeanAnomalyOffsetDeg">Mean anomaly of the first satellite at the start. Range: [-360, 360].</param>
public sealed record ShellSpec(
    string Name,
    int Satellites,
    int Planes,
    int Phasing,
    double InclinationDeg,
    double SemiMajorAxisMeters,
    double Eccentricity,
    double ArgumentOfPerigeeDeg,
    double RaanOffsetDeg,
    double MeanAnomalyOffsetDeg)
{
    /// <summary>
    /// relativity_preset_semi_major_axis_km: the nominal orbit this shell's clocks had their factory offset set
    /// for, metres, overriding [relativity] preset_semi_major_axis_km; NaN when not given.
    /// </summary>
    public double RelativityPresetSemiMajorAxisMeters { get; init; } = double.NaN;
    /// <summary>The shell's own upload interval (s), overriding [clock] upload_interval_h; null: the [clock] value.</summary>
    public double? UploadIntervalSeconds { get; init; }
}

namespace ErrorBudget.Core.Scenarios;

/// <summary>The [relativity] table's keys (and the shell's preset override), and how they become a <see cref="RelativitySpec"/>.</summary>
internal static class RelativityKeys
{
    public const string Applied = "applied";
    public const string Missed = "missed";
    public const string Preset = "preset";

    /// <summary>Preset orbits: above the Earth's surface and no farther than any shell may be, km.</summary>
    private const double PresetMaxKm = 100_000;

    private const double MetersPerKilometer = 1000.0;

    public static readonly KeySpec ShellPreset =
        KeySpec.Number("relativity_preset_semi_major_axis_km", min: ScenarioSchema.EarthEquatorialRadiusKm, max: PresetMaxKm, minInclusive: false)
            with { Optional = true };

    public static readonly TableSpec Table = new("relativity", IsArray: false, Required: false,
    [
        KeySpec.Choice("frequency_offset", Applied, Applied, Missed, Preset),
        KeySpec.Number("preset_semi_major_axis_km", min: ScenarioSchema.EarthEquatorialRadiusKm, max: PresetMaxKm, minInclusive: false)
            with { Optional = true },
        KeySpec.Number("frequency_offset_factor", min: 0, max: 2, defaultValue: 1),
        KeySpec.Choice("eccentricity_term", Applied, Applied, Missed),
        KeySpec.Number("eccentricity_factor", min: 0, max: 2, defaultValue: 1),
        KeySpec.Choice("sagnac", Applied, Applied, Missed),
        KeySpec.Choice("shapiro", Applied, Applied, Missed),
        KeySpec.Choice("ground_absorbs", "offset", "offset", "rate", "none"),
    ]);

    public static RelativitySpec Build(SectionValues r) => new(
        r.Text("frequency_offset") switch
        {
            Missed => FrequencyOffsetMode.Missed,
            Preset => FrequencyOffsetMode.Preset,
            _ => FrequencyOffsetMode.Applied,
        },
        r.Has("preset_semi_major_axis_km") ? r.Number("preset_semi_major_axis_km") * MetersPerKilometer : double.NaN,
        r.Number("frequency_offset_factor"),
        Term(r.Text("eccentricity_term")),
        r.Number("eccentricity_factor"),
        Term(r.Text("sagnac")),
        Term(r.Text("shapiro")),
        r.Text("ground_absorbs") switch
        {
            "rate" => GroundAbsorption.Rate,
            "none" => GroundAbsorption.None,
            _ => GroundAbsorption.Offset,
        });

    /// <summary>The shell's preset override in metres, NaN when not given.</summary>
    public static double ShellPresetMeters(SectionValues shell) =>
        shell.Has(ShellPreset.Name) ? shell.Number(ShellPreset.Name) * MetersPerKilometer : double.NaN;

    private static RelativityTermMode Term(string text) => text == Missed ? RelativityTermMode.Missed : RelativityTermMode.Applied;
}

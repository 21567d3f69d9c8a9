namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// Every table and key a scenario file accepts, with units in the names, defaults and static ranges.
/// Keys without a default are required. Cross-key rules live in RunRules, ShellRules and GridRules.
/// </summary>
internal static class ScenarioSchema
{
    public const int MaxShells = 20;
    public const int MaxEpochs = 100_000;
    public const long MaxCells = 2_000_000;

    /// <summary>WGS-84 semi-major axis, km (WGS-84 defining parameter; REFERENCE-VALUES.md).</summary>
    public const double EarthEquatorialRadiusKm = 6378.137;

    /// <summary>Lowest perigee altitude accepted, km: keeps orbits clear of the atmosphere (common practice).</summary>
    public const double MinPerigeeAltitudeKm = 100.0;

    public const string DefaultStartUtc = "2031-06-01T00:00:00Z";

    /// <summary>[clock] upload_interval_h, also accepted per shell (without a default there).</summary>
    private static readonly KeySpec UploadInterval = KeySpec.Number("upload_interval_h", min: 1.0 / 60.0, max: 720, defaultValue: 12) with
    {
        AllowedText = "1/60 (one minute) <= upload_interval_h <= 720",
    };

    public static readonly TableSpec Run = new("run", IsArray: false, Required: true,
    [
        KeySpec.Integer("seed", min: 0, defaultValue: 1),
        KeySpec.Integer("trials", min: 1, max: 1_000_000),
        new KeySpec("start_utc", KeyKind.Timestamp) { Default = DefaultStartUtc },
        KeySpec.Number("duration_h", min: 0, max: 720, minInclusive: false),
        KeySpec.Number("step_s", min: 1) with { AllowedText = "1 <= step_s <= duration_h * 3600, at most 100000 epochs" },
        KeySpec.Integer("batches", min: 1, max: 100) with { Optional = true, AllowedText = "integer 1 <= batches <= 100 and <= trials (default: 10, or trials if fewer)" },
    ]);

    public static readonly TableSpec Shell = new("shell", IsArray: true, Required: true,
    [
        new KeySpec("name", KeyKind.Text) { Optional = true },
        KeySpec.Integer("satellites", min: 1, max: 1000),
        KeySpec.Integer("planes", min: 1, max: 1000) with { AllowedText = "integer 1 <= planes <= satellites, dividing satellites" },
        KeySpec.Integer("phasing", min: 0, defaultValue: 0) with { AllowedText = "integer 0 <= phasing <= planes - 1" },
        KeySpec.Number("inclination_deg", min: 0, max: 180),
        KeySpec.Number("semi_major_axis_km", min: 0, max: 100_000, minInclusive: false) with
        {
            AllowedText = "semi_major_axis_km * (1 - eccentricity) > 6478.137 (6378.137 km + 100 km) and semi_major_axis_km <= 100000",
        },
        KeySpec.Number("eccentricity", min: 0, max: 0.9, defaultValue: 0),
        KeySpec.Number("argument_of_perigee_deg", min: -360, max: 360, defaultValue: 0),
        KeySpec.Number("raan_offset_deg", min: -360, max: 360, defaultValue: 0),
        KeySpec.Number("mean_anomaly_offset_deg", min: -360, max: 360, defaultValue: 0),
        RelativityKeys.ShellPreset,
        UploadInterval with { Default = null, Optional = true },
    ]);

    public static readonly TableSpec Grid = new("grid", IsArray: false, Required: true,
    [
        KeySpec.Number("lat_step_deg", min: 0, max: 90, minInclusive: false),
        KeySpec.Number("lon_step_deg", min: 0, max: 360, minInclusive: false),
        KeySpec.Number("lat_min_deg", min: -90, max: 90, defaultValue: -90, maxInclusive: false),
        KeySpec.Number("lat_max_deg", min: -90, max: 90, defaultValue: 90, minInclusive: false),
        KeySpec.Number("lon_min_deg", min: -180, max: 180, defaultValue: -180, maxInclusive: false),
        KeySpec.Number("lon_max_deg", min: -180, max: 360, defaultValue: 180, minInclusive: false),
        KeySpec.Number("height_m", min: -500, max: 100_000, defaultValue: 0),
        KeySpec.Number("mask_deg", min: 0, max: 90, defaultValue: 5, maxInclusive: false),
    ]);

    /// <summary>The grade value that defines a clock from its own coefficients or Allan deviation points.</summary>
    public const string CustomGrade = "custom";

    public const string UniformJitter = "uniform";
    public const string GaussianJitter = "gaussian";

    /// <summary>Largest upload jitter (its standard deviation) as a share of the upload interval: keeps uploads in order.</summary>
    public const double MaxJitterShareOfInterval = 0.1;

    /// <summary>Largest power-law coefficient accepted: decades above any clock worth simulating, and far from overflow.</summary>
    public const double MaxCoefficient = 1e-6;

    public static readonly TableSpec Clock = new("clock", IsArray: false, Required: false,
    [
        KeySpec.Number("upload_sigma_m", min: 0, max: 1000, defaultValue: 0.5),
        KeySpec.Number("growth_sigma_m_per_h", min: 0, max: 3600, defaultValue: 0.2),
        UploadInterval,
        new KeySpec("grade", KeyKind.Choice)
        {
            Choices = [.. Clocks.ClockCatalogue.Names, CustomGrade],
            Optional = true,
            AllowedText = $"a catalogue grade ({string.Join(", ", Clocks.ClockCatalogue.Names.Select(n => $"\"{n}\""))}) or \"{CustomGrade}\"",
        },
        KeySpec.Number("h2", min: 0, max: MaxCoefficient) with { Optional = true },
        KeySpec.Number("h0", min: 0, max: MaxCoefficient) with { Optional = true },
        KeySpec.Number("h_minus_1", min: 0, max: MaxCoefficient) with { Optional = true },
        KeySpec.Number("h_minus_2", min: 0, max: MaxCoefficient) with { Optional = true },
        KeySpec.Number("drift_per_day", min: -1e-6, max: 1e-6) with { Optional = true },
        KeySpec.NumberList("adev_tau_s", min: 0, max: 1e8, minInclusive: false),
        KeySpec.NumberList("adev_sigma", min: 0, max: 1e-3, minInclusive: false),
        KeySpec.Number("upload_jitter_s", min: 0, max: 86_400, defaultValue: 0) with
        {
            AllowedText = "0 <= upload_jitter_s <= upload_interval_h * 3600 / 10 (of every shell)",
        },
        KeySpec.Choice("upload_jitter_distribution", UniformJitter, UniformJitter, GaussianJitter),
        KeySpec.Number("estimation_phase_sigma_ns", min: 0, max: 1e6, defaultValue: 1.0),
        KeySpec.Number("estimation_frequency_sigma", min: 0, max: 1e-6, defaultValue: 1e-14),
    ]);

    public static readonly TableSpec Orbit = new("orbit", IsArray: false, Required: false,
    [
        KeySpec.Number("radial_sigma_m", min: 0, max: 1000, defaultValue: 0.3),
        KeySpec.Number("along_sigma_m", min: 0, max: 1000, defaultValue: 1.5),
        KeySpec.Number("cross_sigma_m", min: 0, max: 1000, defaultValue: 0.8),
    ]);

    public const string SingleFrequency = "single-frequency";
    public const string DualFrequency = "dual-frequency";

    private static readonly KeySpec[] UserKeys =
    [
        KeySpec.Choice("ionosphere", DualFrequency, SingleFrequency, DualFrequency),
        KeySpec.Number("iono_vertical_sigma_m", min: 0, max: 100, defaultValue: 2.0),
        KeySpec.Choice("frequency_pair", "L1-L5", "L1-L5", "L1-L2"),
        KeySpec.Number("tropo_zenith_sigma_m", min: 0, max: 10, defaultValue: 0.12),
        KeySpec.Choice("multipath", "airborne", "airborne", "ground", "none"),
        KeySpec.Number("noise_sigma_m", min: 0, max: 100, defaultValue: 0.36),
    ];

    public static readonly TableSpec User = new("user", IsArray: false, Required: false, UserKeys);

    /// <summary>[assumed]: its own URE plus the [user] keys, each left out inherited from [user].</summary>
    public static readonly TableSpec Assumed = new("assumed", IsArray: false, Required: false,
    [
        KeySpec.Number("ure_sigma_m", min: 0, max: 1000, defaultValue: 1.0, minInclusive: false),
        .. UserKeys.Select(k => k with { Default = null, Optional = true }),
    ]);

    public static readonly TableSpec Relativity = RelativityKeys.Table;

    public static readonly IReadOnlyList<TableSpec> Tables =
        [Run, Shell, Grid, Clock, Orbit, User, Assumed, Relativity, IntegrityKeys.Integrity, IntegrityKeys.Faults];

    public static string TableList => string.Join(", ", Tables.Select(t => t.Written));

    public static TableSpec? Find(string name) => Tables.FirstOrDefault(t => t.Name == name);
}

namespace ErrorBudget.Core.Scenarios;

/// <summary>Builds the scenario records from validated values, converting file units to SI (km -> m, h -> s).</summary>
internal static class ScenarioBuilder
{
    private const double MetersPerKilometer = 1000.0;
    private const double SecondsPerHour = 3600.0;
    private const int DefaultBatches = 10;

    public static Scenario Build(ScenarioValues v)
    {
        var user = User(v.User, fallback: null);
        var run = Run(v.Run);
        var assumed = new AssumedModelSpec(v.Assumed.Number("ure_sigma_m"), User(v.Assumed, fallback: user));
        return new Scenario(
            run,
            [.. v.Shells.Select(Shell)],
            Grid(v.Grid),
            Clock(v.Clock, run.StepSeconds),
            new OrbitErrorSpec(v.Orbit.Number("radial_sigma_m"), v.Orbit.Number("along_sigma_m"), v.Orbit.Number("cross_sigma_m")),
            user,
            assumed)
        {
            Relativity = v.Relativity is null ? RelativitySpec.AllApplied : RelativityKeys.Build(v.Relativity),
            Integrity = v.Integrity is null ? null : IntegrityKeys.BuildIntegrity(v.Integrity, assumed.UreSigmaMeters),
            Faults = v.Faults is null ? null : IntegrityKeys.BuildFaults(v.Faults),
            Batches = v.Run.Has("batches") ? (int)v.Run.Integer("batches") : Math.Min(DefaultBatches, run.Trials),
        };
    }

    private static RunSettings Run(SectionValues run) => new(
        (ulong)run.Integer("seed"),
        (int)run.Integer("trials"),
        run.Time("start_utc"),
        run.Number("duration_h") * SecondsPerHour,
        run.Number("step_s"));

    private static ClockSpec Clock(SectionValues c, double stepSeconds)
    {
        var spec = new ClockSpec(
            c.Number("upload_sigma_m"),
            c.Number("growth_sigma_m_per_h") / SecondsPerHour,
            c.Number("upload_interval_h") * SecondsPerHour)
        {
            UploadJitterSeconds = c.Number("upload_jitter_s"),
            JitterDistribution = c.Text("upload_jitter_distribution") == ScenarioSchema.GaussianJitter
                ? UploadJitterDistribution.Gaussian
                : UploadJitterDistribution.Uniform,
        };
        if (!c.Has("grade"))
        {
            return spec;
        }

        var (noise, points, rms) = ClockRules.Resolve(c, stepSeconds);
        return spec with
        {
            Grade = c.Text("grade"),
            Noise = noise,
            AdevPoints = points,
            AdevFitRelativeRms = rms,
            EstimationPhaseSigmaSeconds = c.Number("estimation_phase_sigma_ns") * 1e-9,
            EstimationFrequencySigma = c.Number("estimation_frequency_sigma"),
        };
    }

    private static ShellSpec Shell(SectionValues shell, int index) => new(
        ScenarioValidator.ShellName(shell, index),
        (int)shell.Integer("satellites"),
        (int)shell.Integer("planes"),
        (int)shell.Integer("phasing"),
        shell.Number("inclination_deg"),
        shell.Number("semi_major_axis_km") * MetersPerKilometer,
        shell.Number("eccentricity"),
        shell.Number("argument_of_perigee_deg"),
        shell.Number("raan_offset_deg"),
        shell.Number("mean_anomaly_offset_deg"))
    {
        RelativityPresetSemiMajorAxisMeters = RelativityKeys.ShellPresetMeters(shell),
        UploadIntervalSeconds = shell.Has("upload_interval_h") ? shell.Number("upload_interval_h") * SecondsPerHour : null,
    };

    private static GridSpec Grid(SectionValues g) => new(
        g.Number("lat_step_deg"),
        g.Number("lon_step_deg"),
        g.Number("lat_min_deg"),
        g.Number("lat_max_deg"),
        g.Number("lon_min_deg"),
        g.Number("lon_max_deg"),
        g.Number("height_m"),
        g.Number("mask_deg"));

    /// <summary>The user block; with a <paramref name="fallback"/>, every key left out is taken from it.</summary>
    private static UserEnvironmentSpec User(SectionValues u, UserEnvironmentSpec? fallback) => new(
        u.Has("ionosphere") ? Ionosphere(u.Text("ionosphere")) : fallback!.Ionosphere,
        u.Has("iono_vertical_sigma_m") ? u.Number("iono_vertical_sigma_m") : fallback!.IonoVerticalSigmaMeters,
        u.Has("frequency_pair") ? Pair(u.Text("frequency_pair")) : fallback!.Pair,
        u.Has("tropo_zenith_sigma_m") ? u.Number("tropo_zenith_sigma_m") : fallback!.TropoZenithSigmaMeters,
        u.Has("multipath") ? Multipath(u.Text("multipath")) : fallback!.Multipath,
        u.Has("noise_sigma_m") ? u.Number("noise_sigma_m") : fallback!.NoiseSigmaMeters);

    private static IonosphereMode Ionosphere(string text) =>
        text == ScenarioSchema.SingleFrequency ? IonosphereMode.SingleFrequency : IonosphereMode.DualFrequency;

    private static FrequencyPair Pair(string text) => text == "L1-L2" ? FrequencyPair.L1L2 : FrequencyPair.L1L5;

    private static MultipathModel Multipath(string text) => text switch
    {
        "ground" => MultipathModel.Ground,
        "none" => MultipathModel.None,
        _ => MultipathModel.Airborne,
    };
}

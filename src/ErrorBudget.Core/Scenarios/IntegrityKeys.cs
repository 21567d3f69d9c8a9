namespace ErrorBudget.Core.Scenarios;

/// <summary>The [integrity] and [faults] tables: keys, ranges, cross-key rules and the built records.</summary>
internal static class IntegrityKeys
{
    public const string Custom = "custom";
    public const string Weighted = "weighted";
    public const string Araim = "araim";
    private const double SecondsPerHour = 3600.0;

    /// <summary>Preset keys, in the order of ICAO Annex 10 Table 3.7.2.4-1 (see Integrity.ServiceLevels).</summary>
    public static readonly string[] Services = ["npa", "apv-i", "apv-ii", "lpv-200", Custom];

    public static readonly TableSpec Integrity = new("integrity", IsArray: false, Required: false,
    [
        KeySpec.Choice("service", "lpv-200", Services),
        KeySpec.Number("hal_m", min: 0, max: 100_000, minInclusive: false) with { Optional = true },
        KeySpec.Number("val_m", min: 0, max: 10_000, minInclusive: false) with { Optional = true },
        KeySpec.Choice("protection_levels", Weighted, Weighted, Araim),
        KeySpec.Number("availability_target", min: 0, max: 1, defaultValue: 0.99, minInclusive: false),
        KeySpec.Integer("overbound_trials", min: 0, max: 64, defaultValue: 8),
        KeySpec.Number("ura_sigma_m", min: 0, max: 100, minInclusive: false) with { Optional = true },
        KeySpec.Number("ure_sigma_m", min: 0, max: 100, minInclusive: false) with { Optional = true },
        KeySpec.Number("nominal_bias_m", min: 0, max: 100, defaultValue: 0.75),
        KeySpec.Number("p_sat", min: 0, max: 0.1, defaultValue: 1e-5),
        KeySpec.Number("p_const", min: 0, max: 0.1, defaultValue: 1e-4),
        KeySpec.Number("phmi_vertical", min: 0, max: 1e-2, defaultValue: 9.8e-8, minInclusive: false),
        KeySpec.Number("phmi_horizontal", min: 0, max: 1e-2, defaultValue: 2e-9, minInclusive: false),
        KeySpec.Number("pfa_vertical", min: 0, max: 1e-2, defaultValue: 3.9e-6, minInclusive: false),
        KeySpec.Number("pfa_horizontal", min: 0, max: 1e-2, defaultValue: 9e-8, minInclusive: false),
    ]);

    private static readonly string[] AraimOnly =
        ["ura_sigma_m", "ure_sigma_m", "nominal_bias_m", "p_sat", "p_const", "phmi_vertical", "phmi_horizontal", "pfa_vertical", "pfa_horizontal"];

    public static readonly TableSpec Faults = new("faults", IsArray: false, Required: false,
    [
        KeySpec.Number("clock_step_per_h", min: 0, max: 1, defaultValue: 0),
        KeySpec.Number("clock_step_min_m", min: 0, max: 10_000, defaultValue: 10),
        KeySpec.Number("clock_step_max_m", min: 0, max: 10_000, defaultValue: 100),
        KeySpec.Number("clock_ramp_per_h", min: 0, max: 1, defaultValue: 0),
        KeySpec.Number("clock_ramp_min_m_per_s", min: 0, max: 100, defaultValue: 0.001),
        KeySpec.Number("clock_ramp_max_m_per_s", min: 0, max: 100, defaultValue: 0.05),
        KeySpec.Number("orbit_per_h", min: 0, max: 1, defaultValue: 0),
        KeySpec.Number("orbit_min_m", min: 0, max: 100_000, defaultValue: 10),
        KeySpec.Number("orbit_max_m", min: 0, max: 100_000, defaultValue: 200),
        KeySpec.Number("constellation_per_h", min: 0, max: 1, defaultValue: 0),
        KeySpec.Number("duration_h", min: 0, max: 720, defaultValue: 1, minInclusive: false),
    ]);

    public static void Check(SectionValues integrity, SectionValues faults, bool hasIntegrity, ScenarioErrorList errors)
    {
        if (hasIntegrity && integrity.Has("service"))
        {
            bool custom = integrity.Text("service") == Custom;
            foreach (string key in new[] { "hal_m", "val_m" })
            {
                if (!custom && integrity.Has(key))
                {
                    integrity.Fail(errors, key, $"is set by the preset {integrity.Describe("service")}",
                        $"leave it out, or set integrity.service = \"{Custom}\"");
                }
            }

            if (custom && !integrity.Given("hal_m"))
            {
                integrity.Fail(errors, "service", "is \"custom\" but integrity.hal_m is missing", "integrity.hal_m > 0 (and integrity.val_m > 0 for a vertical service)");
            }
        }

        if (hasIntegrity && integrity.Has("protection_levels") && integrity.Text("protection_levels") != Araim)
        {
            foreach (string key in AraimOnly.Where(integrity.Written))
            {
                integrity.Fail(errors, key, $"is an ARAIM parameter but {integrity.Describe("protection_levels")}",
                    $"leave it out, or set integrity.protection_levels = \"{Araim}\"");
            }
        }

        // sigma_URE bounds sigma_URA from below in an integrity support message (common practice); the
        // exclusion test relies on C_acc <= C_int.
        if (hasIntegrity && integrity.Has("ura_sigma_m", "ure_sigma_m") && integrity.Number("ure_sigma_m") > integrity.Number("ura_sigma_m"))
        {
            integrity.Fail(errors, "ure_sigma_m", $"is above {integrity.Describe("ura_sigma_m")}", "ure_sigma_m <= ura_sigma_m");
        }

        Ordered(faults, "clock_step_min_m", "clock_step_max_m", errors);
        Ordered(faults, "clock_ramp_min_m_per_s", "clock_ramp_max_m_per_s", errors);
        Ordered(faults, "orbit_min_m", "orbit_max_m", errors);
    }

    private static void Ordered(SectionValues t, string min, string max, ScenarioErrorList errors)
    {
        if (t.Has(min, max) && t.Number(min) > t.Number(max))
        {
            t.Fail(errors, min, $"is above {t.Describe(max)}", $"{min} <= {max}");
        }
    }

    public static IntegritySpec BuildIntegrity(SectionValues v, double assumedUreSigmaMeters)
    {
        string service = v.Text("service");
        double hal, val, kh, kv, h95 = double.NaN, v95 = double.NaN;
        if (service == Custom)
        {
            hal = v.Number("hal_m");
            val = v.Has("val_m") ? v.Number("val_m") : double.NaN;
            kh = Core.Integrity.WeightedProtectionLevels.KHorizontalPrecision;
            kv = Core.Integrity.WeightedProtectionLevels.KVerticalPrecision;
        }
        else
        {
            Core.Integrity.ServiceLevels.TryGet(service, out var level);
            hal = level!.HorizontalAlertLimitMeters;
            val = level.VerticalAlertLimitMeters;
            kh = level.KHorizontal;
            kv = level.KVertical;
            h95 = level.HorizontalAccuracy95Meters;
            v95 = level.VerticalAccuracy95Meters;
        }

        double ura = v.Has("ura_sigma_m") ? v.Number("ura_sigma_m") : assumedUreSigmaMeters;
        return new IntegritySpec(
            service,
            hal,
            val,
            kh,
            kv,
            v.Text("protection_levels") == Araim ? ProtectionLevelMethod.Araim : ProtectionLevelMethod.Weighted,
            v.Number("availability_target"),
            (int)v.Integer("overbound_trials"))
        {
            HorizontalAccuracy95Meters = h95,
            VerticalAccuracy95Meters = v95,
            Araim = new AraimSpec(
                ura,
                v.Has("ure_sigma_m") ? v.Number("ure_sigma_m") : ura * 2.0 / 3.0,
                v.Number("nominal_bias_m"),
                v.Number("p_sat"),
                v.Number("p_const"))
            {
                PhmiVertical = v.Number("phmi_vertical"),
                PhmiHorizontal = v.Number("phmi_horizontal"),
                FalseAlarmVertical = v.Number("pfa_vertical"),
                FalseAlarmHorizontal = v.Number("pfa_horizontal"),
            },
        };
    }

    public static FaultSpec BuildFaults(SectionValues f) => new(
        f.Number("clock_step_per_h"),
        f.Number("clock_step_min_m"),
        f.Number("clock_step_max_m"),
        f.Number("clock_ramp_per_h"),
        f.Number("clock_ramp_min_m_per_s"),
        f.Number("clock_ramp_max_m_per_s"),
        f.Number("orbit_per_h"),
        f.Number("orbit_min_m"),
        f.Number("orbit_max_m"),
        f.Number("constellation_per_h"),
        f.Number("duration_h") * SecondsPerHour);
}

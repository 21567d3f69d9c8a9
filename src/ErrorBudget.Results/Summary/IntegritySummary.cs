using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Summary;

/// <summary>The "integrity" member of summary.json (issue 5): empty strings, zeros and nulls without [integrity].</summary>
internal static class IntegritySummary
{
    public static SummaryObject Object() =>
        new("integrity",
            "Service-area integrity figures under [integrity]: availability, coverage, misleading-information rates with "
            + "95 % Clopper-Pearson bounds, ARAIM detection figures and the worst overbounding result. Analysis for design "
            + "studies, not a certified integrity monitor.",
        [
            new SummaryString("service", "Service level (preset key or \"custom\"); empty without [integrity].", null, r => r.Integrity?.Service ?? ""),
            new SummaryString("protection_levels", "\"weighted\" (DO-229) or \"araim\" (MHSS); empty without [integrity].", null, r => r.Integrity?.Method ?? ""),
            new SummaryNumber("hal_m", "Horizontal alert limit.", "m", true, r => r.Integrity?.HorizontalAlertLimitMeters ?? double.NaN, Minimum: 0),
            new SummaryNumber("val_m", "Vertical alert limit; null for a service without one.", "m", true, r => r.Integrity?.VerticalAlertLimitMeters ?? double.NaN, Minimum: 0),
            new SummaryNumber("availability", "Area-weighted share of epochs with PL <= AL.", "1", true, r => r.Integrity?.Global.Availability ?? double.NaN, 0, 1),
            new SummaryNumber("availability_target", "Availability a cell needs to count as covered.", "1", true, r => r.Integrity?.AvailabilityTarget ?? double.NaN, 0, 1),
            new SummaryNumber("coverage", "Area-weighted share of cells whose availability meets the target.", "1", true, r => r.Integrity?.Global.Coverage ?? double.NaN, 0, 1),
            new SummaryNumber("h95_requirement_m", "The service's 95 % horizontal accuracy requirement; null for none (custom).", "m", true, r => r.Integrity?.Global.HorizontalAccuracy95Meters ?? double.NaN, Minimum: 0),
            new SummaryNumber("v95_requirement_m", "The service's 95 % vertical accuracy requirement; null for none.", "m", true, r => r.Integrity?.Global.VerticalAccuracy95Meters ?? double.NaN, Minimum: 0),
            new SummaryNumber("accuracy_area_share", "Area-weighted share of cells whose HPE and VPE 95th percentiles meet those requirements; null without requirements.", "1", true, r => r.Integrity?.Global.AccuracyAreaShare ?? double.NaN, 0, 1),
            .. Rate("mi_horizontal", "Misleading information, horizontal (HPE > HPL) over all samples", r => r.Integrity?.Global.MisleadingHorizontal),
            .. Rate("mi_vertical", "Misleading information, vertical (VPE > VPL) over all samples", r => r.Integrity?.Global.MisleadingVertical),
            .. Rate("hmi_horizontal", "Hazardously misleading information, horizontal (HPE > HAL) over the available samples", r => r.Integrity?.Global.HazardousHorizontal),
            .. Rate("hmi_vertical", "Hazardously misleading information, vertical (VPE > VAL) over the available samples", r => r.Integrity?.Global.HazardousVertical),
            .. Rate("detection", "ARAIM detections over all samples", r => r.Integrity?.Global.Detections),
            .. Rate("missed_detection", "ARAIM missed detections over the faulted samples", r => r.Integrity?.Global.MissedDetections),
            new SummaryInteger("exclusions", "ARAIM detections followed by a successful exclusion.", "1", r => r.Integrity?.Global.Exclusions ?? 0, 0),
            new SummaryInteger("faulted_samples", "Samples with an injected fault on a satellite in view.", "1", r => r.Integrity?.Global.FaultedSamples ?? 0, 0),
            new SummaryNumber("worst_required_inflation", "Largest required inflation of the assumed sigma in overbound.parquet (infinite is written as null with worst_overbound_group set).", "1", true, r => Finite(r.Integrity?.Global.WorstRequiredInflation), Minimum: 0),
            new SummaryString("worst_overbound_group", "Shell and elevation bin of that largest inflation; empty when none.", null, r => r.Integrity?.Global.WorstOverboundGroup ?? ""),
        ]);

    private static double Finite(double? x) => x is { } v && double.IsFinite(v) ? v : double.NaN;

    private static IEnumerable<SummaryField> Rate(string name, string what, Func<RunResult, EventRate?> get) =>
    [
        new SummaryInteger($"{name}_events", what + ": events.", "1", r => get(r)?.Events ?? 0, 0),
        new SummaryNumber($"{name}_rate", what + ": events per sample; null without samples.", "1", true, r => get(r)?.Rate ?? double.NaN, 0, 1),
        new SummaryNumber($"{name}_rate_upper", what + ": 95 % Clopper-Pearson upper bound of the rate.", "1", true, r => get(r)?.Upper ?? double.NaN, 0, 1),
    ];
}

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [integrity]: the service the receiver must deliver and how it bounds its errors. Present only
/// when the scenario has the table; a run without it computes no protection levels.
/// </summary>
/// <param name="Service">Preset key ("npa", "apv-i", "apv-ii", "lpv-200") or "custom".</param>
/// <param name="HorizontalAlertLimitMeters">HAL, m. Range: &gt; 0.</param>
/// <param name="VerticalAlertLimitMeters">VAL, m; NaN for a service with no vertical requirement (npa).</param>
/// <param name="KHorizontal">DO-229 K_H of the service (6.18 non-precision, 6.0 approach).</param>
/// <param name="KVertical">DO-229 K_V (5.33).</param>
/// <param name="Method">Protection-level algorithm.</param>
/// <param name="AvailabilityTarget">Share of epochs a cell must be available to count as covered. Range: (0, 1].</param>
/// <param name="OverboundTrials">Trials per (epoch, user) whose per-satellite range errors feed the overbounding check. Range: 0..64.</param>
public sealed record IntegritySpec(
    string Service,
    double HorizontalAlertLimitMeters,
    double VerticalAlertLimitMeters,
    double KHorizontal,
    double KVertical,
    ProtectionLevelMethod Method,
    double AvailabilityTarget,
    int OverboundTrials)
{
    /// <summary>ARAIM user parameters (used with <see cref="ProtectionLevelMethod.Araim"/>).</summary>
    public AraimSpec Araim { get; init; } = AraimSpec.Baseline(1.0);

    /// <summary>95 % accuracy requirements of the preset (ICAO Annex 10 Table 3.7.2.4-1), m; NaN for none (custom).</summary>
    public double HorizontalAccuracy95Meters { get; init; } = double.NaN;
    public double VerticalAccuracy95Meters { get; init; } = double.NaN;

    /// <summary>True when the service has a vertical alert limit.</summary>
    public bool HasVertical => !double.IsNaN(VerticalAlertLimitMeters);
}

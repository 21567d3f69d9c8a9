namespace ErrorBudget.Core.Integrity;

/// <summary>
/// A navigation service level: the alert limits and 95 % accuracies a user's position must meet, the
/// integrity risk they are met at, and the K factors that turn the position sigmas into protection levels.
/// </summary>
/// <param name="Name">Preset key ("npa", "apv-i", "apv-ii", "lpv-200") or "custom".</param>
/// <param name="HorizontalAlertLimitMeters">HAL, m. Range: &gt; 0.</param>
/// <param name="VerticalAlertLimitMeters">VAL, m, or NaN when the operation has no vertical guidance. Range: &gt; 0 or NaN.</param>
/// <param name="HorizontalAccuracy95Meters">Required 95 % horizontal position error, m, or NaN when none is set.</param>
/// <param name="VerticalAccuracy95Meters">Required 95 % vertical position error, m, or NaN when none is set.</param>
/// <param name="IntegrityRisk">Probability of misleading information allowed per <paramref name="IntegrityRiskPer"/>
/// (the requirement "1 − 2e-7 per approach" is stored as 2e-7). Range: (0, 1).</param>
/// <param name="IntegrityRiskPer">The exposure the integrity risk is counted over, e.g. "hour" or "approach".</param>
/// <param name="KHorizontal">K_H: 6.18 for en route / non-precision, 6.0 for approaches with vertical guidance.</param>
/// <param name="KVertical">K_V: 5.33.</param>
public sealed record ServiceLevel(
    string Name,
    double HorizontalAlertLimitMeters,
    double VerticalAlertLimitMeters,
    double HorizontalAccuracy95Meters,
    double VerticalAccuracy95Meters,
    double IntegrityRisk,
    string IntegrityRiskPer,
    double KHorizontal,
    double KVertical);

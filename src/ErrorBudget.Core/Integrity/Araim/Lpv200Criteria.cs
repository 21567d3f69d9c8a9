namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>
/// LPV-200 availability criteria for an ARAIM epoch (REFERENCE-VALUES §5, suggested check 27).
/// VAL 35 m and HAL 40 m: ICAO Annex 10 Vol. I signal-in-space table (verified, REFERENCE-VALUES §6).
/// EMT 15 m and σ_acc 1.87 m: ARAIM ATSG criteria, from memory (1.87 m = 10 m / 5.33, derived).
/// </summary>
internal static class Lpv200Criteria
{
    /// <summary>Vertical alert limit, metres.</summary>
    public const double VerticalAlertLimitMeters = 35.0;

    /// <summary>Horizontal alert limit, metres.</summary>
    public const double HorizontalAlertLimitMeters = 40.0;

    /// <summary>Largest effective monitor threshold, metres.</summary>
    public const double EffectiveMonitorThresholdLimitMeters = 15.0;

    /// <summary>Largest vertical accuracy sigma, metres.</summary>
    public const double SigmaAccuracyLimitMeters = 1.87;

    /// <summary>True when VPL ≤ 35 m, HPL ≤ 40 m, EMT ≤ 15 m, σ_acc ≤ 1.87 m and P_not_monitored ≤ P_THRES.</summary>
    public static bool IsAvailable(in AraimResult result) =>
        result.UnmonitoredWithinThreshold
        && result.VplMeters <= VerticalAlertLimitMeters
        && result.HplMeters <= HorizontalAlertLimitMeters
        && result.EffectiveMonitorThresholdMeters <= EffectiveMonitorThresholdLimitMeters
        && result.SigmaAccuracyVerticalMeters <= SigmaAccuracyLimitMeters;
}

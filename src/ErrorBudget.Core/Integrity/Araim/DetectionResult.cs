namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>Outcome of the solution-separation test on one sample of range errors.</summary>
/// <param name="Detected">Some |x̂_q⁽ᵏ⁾ − x̂_q⁽⁰⁾| exceeded its threshold T_k,q.</param>
/// <param name="ExcludedMode">The fault mode k whose subset solution is used after exclusion; −1 when there
/// was no detection or no candidate passed (the all-in-view solution is then used).</param>
internal readonly record struct DetectionResult(bool Detected, int ExcludedMode)
{
    /// <summary>A fault was detected but not excluded: the caller should raise an alert.</summary>
    public bool ExclusionFailed => Detected && ExcludedMode < 0;
}

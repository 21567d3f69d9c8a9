namespace ErrorBudget.Core.Scenarios;

/// <summary>How the simulated receiver computes its protection levels ([integrity] protection_levels).</summary>
public enum ProtectionLevelMethod
{
    /// <summary>RTCA DO-229 appendix J weighted least squares: HPL = K_H d_major, VPL = K_V d_U.</summary>
    Weighted,

    /// <summary>Baseline ARAIM multiple-hypothesis solution separation, with fault detection and exclusion.</summary>
    Araim,
}

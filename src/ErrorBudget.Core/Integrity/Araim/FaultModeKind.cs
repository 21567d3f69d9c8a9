namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>What a monitored fault mode removes from the all-in-view set.</summary>
internal enum FaultModeKind
{
    /// <summary>One satellite (prior P_sat).</summary>
    Satellite = 0,

    /// <summary>Every satellite of one constellation (prior P_const).</summary>
    Constellation = 1,
}

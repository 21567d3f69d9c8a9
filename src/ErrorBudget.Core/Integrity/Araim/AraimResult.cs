namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>Protection levels and availability figures of one ARAIM evaluation (one user, one epoch).</summary>
/// <param name="HplMeters">HPL = √(HPL_E² + HPL_N²), metres; +∞ when the unmonitored share uses up the budget.</param>
/// <param name="VplMeters">VPL, metres; +∞ as for HPL.</param>
/// <param name="SigmaAccuracyVerticalMeters">σ_acc = √(e₃ᵀ S⁽⁰⁾ C_acc S⁽⁰⁾ᵀ e₃), metres.</param>
/// <param name="EffectiveMonitorThresholdMeters">EMT = max T_k,3 over modes with p_fault,k ≥ P_EMT, metres; 0 when there is none.</param>
/// <param name="FaultModes">Monitored fault modes (fault-free mode not counted). Range: ≥ 0.</param>
/// <param name="UnmonitorableModes">Single-satellite and constellation modes that could not be monitored
/// (fewer than 4 satellites left, or an unsolvable subset); their priors are in <paramref name="UnmonitoredPrior"/>.</param>
/// <param name="UnmonitoredPrior">P_not_monitored: the prior of two or more simultaneous faults plus the priors
/// of the unmonitorable modes. Range: ≥ 0.</param>
/// <param name="UnmonitoredWithinThreshold">P_not_monitored ≤ P_THRES; when false the epoch is not available.</param>
internal readonly record struct AraimResult(
    double HplMeters,
    double VplMeters,
    double SigmaAccuracyVerticalMeters,
    double EffectiveMonitorThresholdMeters,
    int FaultModes,
    int UnmonitorableModes,
    double UnmonitoredPrior,
    bool UnmonitoredWithinThreshold);

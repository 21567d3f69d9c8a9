namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// The ARAIM receiver's integrity support message as the scenario states it ([integrity] keys):
/// what the receiver assumes, not what the truth does.
/// </summary>
/// <param name="UraSigmaMeters">sigma_URA, integrity, m. Range: &gt; 0.</param>
/// <param name="UreSigmaMeters">sigma_URE, accuracy and continuity, m. Range: &gt; 0.</param>
/// <param name="NominalBiasMeters">b_nom, m. Range: &gt;= 0.</param>
/// <param name="SatelliteFaultPrior">P_sat per satellite per approach. Range: [0, 0.1].</param>
/// <param name="ConstellationFaultPrior">P_const per shell per approach. Range: [0, 0.1].</param>
public sealed record AraimSpec(
    double UraSigmaMeters,
    double UreSigmaMeters,
    double NominalBiasMeters,
    double SatelliteFaultPrior,
    double ConstellationFaultPrior)
{
    /// <summary>Integrity and continuity allocations (WG-C ARAIM ADD v3.0 baseline, from memory): PHMI_VERT, PHMI_HOR, P_FA_VERT, P_FA_HOR.</summary>
    public double PhmiVertical { get; init; } = 9.8e-8;
    public double PhmiHorizontal { get; init; } = 2e-9;
    public double FalseAlarmVertical { get; init; } = 3.9e-6;
    public double FalseAlarmHorizontal { get; init; } = 9e-8;

    /// <summary>
    /// WG-C ARAIM TSG baseline simulation values (from memory, see REFERENCE-VALUES section 5):
    /// sigma_URE = 2/3 sigma_URA, b_nom = 0.75 m, P_sat = 1e-5, P_const = 1e-4.
    /// </summary>
    public static AraimSpec Baseline(double uraSigmaMeters) =>
        new(uraSigmaMeters, uraSigmaMeters * 2.0 / 3.0, 0.75, 1e-5, 1e-4);
}

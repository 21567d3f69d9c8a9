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
    /// <summary>
    /// WG-C ARAIM TSG baseline simulation values (from memory, see REFERENCE-VALUES section 5):
    /// sigma_URE = 2/3 sigma_URA, b_nom = 0.75 m, P_sat = 1e-5, P_const = 1e-4.
    /// </summary>
    public static AraimSpec Baseline(double uraSigmaMeters) =>
        new(uraSigmaMeters, uraSigmaMeters * 2.0 / 3.0, 0.75, 1e-5, 1e-4);
}

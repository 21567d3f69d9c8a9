namespace ErrorBudget.Core.Integrity;

/// <summary>Horizontal and vertical protection levels of one user at one epoch, in metres.</summary>
/// <param name="HplMeters">Horizontal protection level, K_H · d_major. Range: ≥ 0.</param>
/// <param name="VplMeters">Vertical protection level, K_V · d_U. Range: ≥ 0.</param>
internal readonly record struct ProtectionLevels(double HplMeters, double VplMeters);

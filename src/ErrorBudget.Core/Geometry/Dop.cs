namespace ErrorBudget.Core.Geometry;

/// <summary>
/// Dilutions of precision of one user's geometry, from the unweighted normal matrix
/// H = (GᵀG)⁻¹ in local East/North/Up plus receiver clock (metres of range). Unitless, each ≥ 0.
/// </summary>
/// <param name="Gdop">Geometric DOP, √tr H.</param>
/// <param name="Pdop">Position DOP, √(H₁₁ + H₂₂ + H₃₃).</param>
/// <param name="Hdop">Horizontal DOP, √(H₁₁ + H₂₂).</param>
/// <param name="Vdop">Vertical DOP, √H₃₃.</param>
/// <param name="Tdop">Time DOP, √H₄₄ (clock expressed in metres of range).</param>
public readonly record struct Dop(double Gdop, double Pdop, double Hdop, double Vdop, double Tdop);

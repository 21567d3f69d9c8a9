using MathNet.Numerics;

namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>
/// The standard normal tail Q(x) = P(Z &gt; x) = ½·erfc(x/√2) and its inverse, as used by the ARAIM
/// threshold and protection-level equations. Allocation-free (MathNet's erfc and erfc⁻¹).
/// </summary>
internal static class GaussianTail
{
    private const double Sqrt2 = 1.4142135623730950488;

    /// <summary>Q(x) = ½·erfc(x/√2). Range: any x (Q(−∞) = 1, Q(+∞) = 0).</summary>
    public static double Q(double x) => 0.5 * SpecialFunctions.Erfc(x / Sqrt2);

    /// <summary>Q⁻¹(p) = √2·erfc⁻¹(2p): the x with Q(x) = p. Range: 0 &lt; p &lt; 1 (NaN outside).</summary>
    public static double InverseQ(double p) => p > 0.0 && p < 1.0 ? Sqrt2 * SpecialFunctions.ErfcInv(2.0 * p) : double.NaN;
}

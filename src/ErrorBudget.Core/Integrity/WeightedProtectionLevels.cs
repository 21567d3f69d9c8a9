namespace ErrorBudget.Core.Integrity;

/// <summary>
/// Protection levels of the weighted least-squares position (RTCA DO-229 appendix J): from the position
/// covariance D = (GᵀWG)⁻¹, d_E² = D₁₁, d_N² = D₂₂, d_EN = D₁₂, d_U² = D₃₃,
/// d_major = √[(d_E² + d_N²)/2 + √(((d_E² − d_N²)/2)² + d_EN²)], HPL = K_H · d_major, VPL = K_V · d_U.
/// </summary>
/// <remarks>
/// <para>D is the 4 × 4 row-major covariance in East, North, Up, clock order that
/// <see cref="Geometry.PositionSolution.TrySolve"/> writes, so D₁₁ = [0], D₁₂ = [1], D₂₂ = [5], D₃₃ = [10].</para>
/// <para>d_major is the semi-major axis of the 1-σ horizontal error ellipse: the larger eigenvalue of the
/// East/North block, square-rooted. Formulas and K factors are from memory (REFERENCE-VALUES §4, status M);
/// K_V = 5.33 matches Q⁻¹(0.5e-7) = 5.327, a two-sided 1e-7 Gaussian bound (derived).</para>
/// <para>No allocation; NaN entries propagate to NaN levels.</para>
/// </remarks>
internal static class WeightedProtectionLevels
{
    /// <summary>K_V for precision approach (LPV, APV), RTCA DO-229 appendix J, from memory.</summary>
    public const double KVerticalPrecision = 5.33;

    /// <summary>K_H for precision approach (LPV, APV), RTCA DO-229 appendix J, from memory.</summary>
    public const double KHorizontalPrecision = 6.0;

    /// <summary>K_H for en route, terminal and non-precision approach, RTCA DO-229 appendix J, from memory.</summary>
    public const double KHorizontalNonPrecision = 6.18;

    private const int CovarianceLength = 16;
    private const int EastEast = 0;
    private const int EastNorth = 1;
    private const int NorthNorth = 5;
    private const int UpUp = 10;

    /// <summary>
    /// d_major, the semi-major axis of the 1-σ horizontal error ellipse, m.
    /// </summary>
    /// <param name="covariance4">D = (GᵀWG)⁻¹, 4 × 4 row-major (E, N, U, clock), m². Length ≥ 16.</param>
    /// <exception cref="ArgumentOutOfRangeException">The span holds fewer than 16 entries.</exception>
    public static double SemiMajorAxisMeters(ReadOnlySpan<double> covariance4)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(covariance4.Length, CovarianceLength, nameof(covariance4));
        double ee = covariance4[EastEast];
        double nn = covariance4[NorthNorth];
        double en = covariance4[EastNorth];
        double halfDifference = 0.5 * (ee - nn);
        // Both square roots see non-negative arguments for any covariance (d_E², d_N² ≥ 0), so no clamp.
        return Math.Sqrt((0.5 * (ee + nn)) + Math.Sqrt((halfDifference * halfDifference) + (en * en)));
    }

    /// <summary>d_U = √D₃₃, the 1-σ vertical error, m.</summary>
    /// <param name="covariance4">D = (GᵀWG)⁻¹, 4 × 4 row-major (E, N, U, clock), m². Length ≥ 16.</param>
    /// <exception cref="ArgumentOutOfRangeException">The span holds fewer than 16 entries.</exception>
    public static double VerticalSigmaMeters(ReadOnlySpan<double> covariance4)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(covariance4.Length, CovarianceLength, nameof(covariance4));
        return Math.Sqrt(covariance4[UpUp]);
    }

    /// <summary>HPL = K_H · d_major and VPL = K_V · d_U, m.</summary>
    /// <param name="covariance4">D = (GᵀWG)⁻¹, 4 × 4 row-major (E, N, U, clock), m². Length ≥ 16.</param>
    /// <param name="kHorizontal">K_H, e.g. <see cref="KHorizontalPrecision"/>. Range: K_H &gt; 0 and finite.</param>
    /// <param name="kVertical">K_V, e.g. <see cref="KVerticalPrecision"/>. Range: K_V &gt; 0 and finite.</param>
    /// <exception cref="ArgumentOutOfRangeException">A span is too short or a K factor is out of range.</exception>
    public static ProtectionLevels Compute(ReadOnlySpan<double> covariance4, double kHorizontal, double kVertical)
    {
        RequirePositiveFinite(kHorizontal, nameof(kHorizontal));
        RequirePositiveFinite(kVertical, nameof(kVertical));
        return new ProtectionLevels(
            HplMeters: kHorizontal * SemiMajorAxisMeters(covariance4),
            VplMeters: kVertical * VerticalSigmaMeters(covariance4));
    }

    private static void RequirePositiveFinite(double k, string name)
    {
        if (!(k > 0.0) || !double.IsFinite(k))
        {
            throw new ArgumentOutOfRangeException(name, k, "A K factor must be > 0 and finite.");
        }
    }
}

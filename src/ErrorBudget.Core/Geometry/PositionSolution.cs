using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Geometry;

/// <summary>
/// Weighted least-squares snapshot position solution of one user at one epoch, linearised about the
/// true position, in local East/North/Up (ENU) plus receiver clock, all in metres.
/// </summary>
/// <remarks>
/// <para>Sign convention (written once, here). Pseudorange ρᵢ = |rᵢ − x| + c·δt_rcv + …; its gradient
/// with respect to the user state [E, N, U, c·δt] is the geometry row Gᵢ = [−eᵢ, −nᵢ, −uᵢ, 1],
/// where (eᵢ, nᵢ, uᵢ) is the unit line of sight from the user to satellite i (RTCA DO-229 appendix J;
/// the standard DOP derivation). With εᵢ = measured − modelled pseudorange error of satellite i, the
/// estimate error dx = x̂ − x_true = S ε, S = (GᵀWG)⁻¹GᵀW, W = diag(wᵢ).</para>
/// <para>Consequence worth remembering: a range error common to every satellite moves only the
/// clock estimate (rows E, N, U of S sum to zero; row clock sums to one).</para>
/// </remarks>
public static partial class PositionSolution
{
    /// <summary>Row index of East in <c>projection</c> (4 × m, row-major).</summary>
    internal const int East = 0;

    /// <summary>Row index of North.</summary>
    internal const int North = 1;

    /// <summary>Row index of Up.</summary>
    internal const int Up = 2;

    /// <summary>Row index of the receiver clock (metres of range).</summary>
    internal const int Clock = 3;

    /// <summary>A solution needs at least as many satellites as unknowns.</summary>
    internal const int MinSatellites = 4;

    /// <summary>A Cholesky pivot at or below this fraction of the trace counts as singular.</summary>
    internal const double RelativePivotTolerance = 1e-12;

    /// <summary>Geometries with GDOP above this are treated as unusable (ill conditioned).</summary>
    internal const double MaxGdop = 1e4;

    /// <summary>
    /// Solves the weighted least-squares geometry of one user: projection S, covariance (GᵀWG)⁻¹
    /// and the unweighted DOPs. Does not allocate.
    /// </summary>
    /// <param name="lineOfSightEnu">Unit vectors from the user to each satellite in ENU; m = length.</param>
    /// <param name="weights">wᵢ = 1/σᵢ² of the assumed model, 1/m². Range: wᵢ ≥ 0 and finite (0 excludes a
    /// satellite from the estimate; it still counts in the DOPs). Length m.</param>
    /// <param name="projection">Receives S, 4 rows × m columns, row-major: <c>projection[q*m + i]</c>,
    /// q = 0 East, 1 North, 2 Up, 3 clock (m per m). Length ≥ 4m; only the first 4m are written.</param>
    /// <param name="covariance">Receives (GᵀWG)⁻¹, 4 × 4 row-major, m². Length ≥ 16.</param>
    /// <param name="dop">The DOPs of the unweighted geometry.</param>
    /// <returns>False, with the outputs unspecified, when m &lt; 4, a weight is negative or not finite,
    /// either normal matrix has a Cholesky pivot ≤ 1e-12 × its trace, or GDOP &gt; 1e4.</returns>
    /// <exception cref="ArgumentException">A span is too short or the weights do not match the lines of sight.</exception>
    public static bool TrySolve(
        ReadOnlySpan<Vec3> lineOfSightEnu,
        ReadOnlySpan<double> weights,
        Span<double> projection,
        Span<double> covariance,
        out Dop dop)
    {
        int m = lineOfSightEnu.Length;
        if (weights.Length != m)
        {
            throw new ArgumentException("weights must have one entry per line of sight.", nameof(weights));
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(projection.Length, 4 * m, nameof(projection));
        ArgumentOutOfRangeException.ThrowIfLessThan(covariance.Length, 16, nameof(covariance));

        dop = default;
        if (m < MinSatellites)
        {
            return false;
        }

        // Lower triangles of GᵀWG (a..) and GᵀG (u..). With g = [−e, −n, −u, 1]: g3 = 1.
        double a00 = 0, a10 = 0, a11 = 0, a20 = 0, a21 = 0, a22 = 0, a30 = 0, a31 = 0, a32 = 0, a33 = 0;
        double u00 = 0, u10 = 0, u11 = 0, u20 = 0, u21 = 0, u22 = 0, u30 = 0, u31 = 0, u32 = 0;
        for (int i = 0; i < m; i++)
        {
            double w = weights[i];
            if (!(w >= 0.0) || !double.IsFinite(w))
            {
                return false;
            }

            Vec3 los = lineOfSightEnu[i];
            double g0 = -los.X, g1 = -los.Y, g2 = -los.Z;
            u00 += g0 * g0; u10 += g1 * g0; u11 += g1 * g1;
            u20 += g2 * g0; u21 += g2 * g1; u22 += g2 * g2;
            u30 += g0; u31 += g1; u32 += g2;

            double w0 = w * g0, w1 = w * g1, w2 = w * g2;
            a00 += w0 * g0; a10 += w1 * g0; a11 += w1 * g1;
            a20 += w2 * g0; a21 += w2 * g1; a22 += w2 * g2;
            a30 += w0; a31 += w1; a32 += w2; a33 += w;
        }

        Span<double> normal = stackalloc double[16];

        // The DOPs need only the diagonal of (GᵀG)⁻¹.
        FillLower(normal, u00, u10, u11, u20, u21, u22, u30, u31, u32, m);
        if (!SymmetricMatrix4.TryInverseDiagonal(normal, RelativePivotTolerance, out double hE, out double hN, out double hU, out double hT))
        {
            return false;
        }

        double gdop = Math.Sqrt(hE + hN + hU + hT);
        if (!(gdop <= MaxGdop))
        {
            return false;
        }

        FillLower(normal, a00, a10, a11, a20, a21, a22, a30, a31, a32, a33);
        if (!SymmetricMatrix4.TryInvert(normal, covariance, RelativePivotTolerance))
        {
            return false;
        }

        // S = (GᵀWG)⁻¹ Gᵀ W, column i = wᵢ · cov · gᵢ.
        for (int i = 0; i < m; i++)
        {
            Vec3 los = lineOfSightEnu[i];
            double w = weights[i];
            double g0 = -los.X, g1 = -los.Y, g2 = -los.Z;
            for (int q = 0; q < 4; q++)
            {
                int r = q * 4;
                projection[(q * m) + i] =
                    w * ((covariance[r] * g0) + (covariance[r + 1] * g1) + (covariance[r + 2] * g2) + covariance[r + 3]);
            }
        }

        dop = new Dop(
            Gdop: gdop,
            Pdop: Math.Sqrt(hE + hN + hU),
            Hdop: Math.Sqrt(hE + hN),
            Vdop: Math.Sqrt(hU),
            Tdop: Math.Sqrt(hT));
        return true;
    }

    private static void FillLower(
        Span<double> n, double n00, double n10, double n11, double n20, double n21, double n22,
        double n30, double n31, double n32, double n33)
    {
        n[0] = n00;
        n[4] = n10; n[5] = n11;
        n[8] = n20; n[9] = n21; n[10] = n22;
        n[12] = n30; n[13] = n31; n[14] = n32; n[15] = n33;
    }
}

using System.Runtime.Intrinsics;
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

        // GᵀWG and GᵀG accumulated a row at a time in Vector256 (row r += (w g_r) g, lanes c = 0..3,
        // g = [−e, −n, −u, 1]); each lane sees the products and sums of the scalar form in the same order
        // (no fused multiply-add), so the lower triangles below hold the scalar form's bits.
        var a0 = Vector256<double>.Zero;
        var a1 = Vector256<double>.Zero;
        var a2 = Vector256<double>.Zero;
        var a3 = Vector256<double>.Zero;
        var u0 = Vector256<double>.Zero;
        var u1 = Vector256<double>.Zero;
        var u2 = Vector256<double>.Zero;
        for (int i = 0; i < m; i++)
        {
            double w = weights[i];
            if (!(w >= 0.0) || !double.IsFinite(w))
            {
                return false;
            }

            Vec3 los = lineOfSightEnu[i];
            double g0 = -los.X, g1 = -los.Y, g2 = -los.Z;
            var g = Vector256.Create(g0, g1, g2, 1.0);
            u0 += Vector256.Create(g0) * g;
            u1 += Vector256.Create(g1) * g;
            u2 += Vector256.Create(g2) * g;
            a0 += Vector256.Create(w * g0) * g;
            a1 += Vector256.Create(w * g1) * g;
            a2 += Vector256.Create(w * g2) * g;
            a3 += Vector256.Create(w) * g;
        }

        // Lower triangles of GᵀWG (a_rc from row r) and GᵀG (u_rc; u3c = Σ g_c is row c's lane 3).
        double a00 = a0[0], a10 = a1[0], a11 = a1[1], a20 = a2[0], a21 = a2[1], a22 = a2[2];
        double a30 = a3[0], a31 = a3[1], a32 = a3[2], a33 = a3[3];
        double u00 = u0[0], u10 = u1[0], u11 = u1[1], u20 = u2[0], u21 = u2[1], u22 = u2[2];
        double u30 = u0[3], u31 = u1[3], u32 = u2[3];

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

        // S = (GᵀWG)⁻¹ Gᵀ W, column i = wᵢ · cov · gᵢ: the four rows as the lanes of the covariance's
        // columns, in the scalar form's order (((c_q0 g0 + c_q1 g1) + c_q2 g2) + c_q3) w.
        var c0 = Vector256.Create(covariance[0], covariance[4], covariance[8], covariance[12]);
        var c1 = Vector256.Create(covariance[1], covariance[5], covariance[9], covariance[13]);
        var c2 = Vector256.Create(covariance[2], covariance[6], covariance[10], covariance[14]);
        var c3 = Vector256.Create(covariance[3], covariance[7], covariance[11], covariance[15]);
        Span<double> rows = projection[..(4 * m)];
        for (int i = 0; i < m; i++)
        {
            Vec3 los = lineOfSightEnu[i];
            var column = ((((c0 * Vector256.Create(-los.X)) + (c1 * Vector256.Create(-los.Y))) + (c2 * Vector256.Create(-los.Z))) + c3)
                * Vector256.Create(weights[i]);
            rows[i] = column[0];
            rows[m + i] = column[1];
            rows[(2 * m) + i] = column[2];
            rows[(3 * m) + i] = column[3];
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

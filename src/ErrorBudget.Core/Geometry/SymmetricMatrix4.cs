namespace ErrorBudget.Core.Geometry;

/// <summary>
/// Hand-written 4 × 4 symmetric positive-definite algebra for the hot path (no allocation).
/// Matrices are row-major spans of 16 doubles.
/// </summary>
/// <remarks>
/// Written out in scalars (no loops, no scratch spans): it runs twice per (epoch, user); in a `perf`
/// profile of W1 the looped form with its stack buffers took 4.4 % of the samples, this form 2.6 %
/// (issue 6, 2026-12-02). The operations and their
/// order are those of the textbook loops (Cholesky, forward substitution for M = L⁻¹, A⁻¹ = MᵀM,
/// each sum started from 0), so the bits are the looped form's.
/// </remarks>
internal static class SymmetricMatrix4
{
    /// <summary>
    /// Inverts a symmetric positive-definite 4 × 4 matrix through its Cholesky factor.
    /// Only the lower triangle of <paramref name="matrix"/> is read; <paramref name="inverse"/>
    /// receives the full symmetric inverse. Returns false (inverse unspecified) when a pivot is
    /// not above <paramref name="relativePivotTolerance"/> × trace, or on NaN/∞ input.
    /// </summary>
    public static bool TryInvert(ReadOnlySpan<double> matrix, Span<double> inverse, double relativePivotTolerance)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(inverse.Length, 16, nameof(inverse));
        if (!TryInverseFactor(matrix, relativePivotTolerance, out InverseFactor m))
        {
            return false;
        }

        inverse[0] = m.Diagonal0;
        inverse[5] = m.Diagonal1;
        inverse[10] = m.Diagonal2;
        inverse[15] = m.Diagonal3;
        inverse[1] = inverse[4] = 0.0 + (m.M10 * m.M11) + (m.M20 * m.M21) + (m.M30 * m.M31);
        inverse[2] = inverse[8] = 0.0 + (m.M20 * m.M22) + (m.M30 * m.M32);
        inverse[3] = inverse[12] = 0.0 + (m.M30 * m.M33);
        inverse[6] = inverse[9] = 0.0 + (m.M21 * m.M22) + (m.M31 * m.M32);
        inverse[7] = inverse[13] = 0.0 + (m.M31 * m.M33);
        inverse[11] = inverse[14] = 0.0 + (m.M32 * m.M33);
        return true;
    }

    /// <summary>
    /// The diagonal of the inverse only (what the DOPs need), the same values as <see cref="TryInvert"/>
    /// gives there; false under the same conditions.
    /// </summary>
    public static bool TryInverseDiagonal(ReadOnlySpan<double> matrix, double relativePivotTolerance, out double d0, out double d1, out double d2, out double d3)
    {
        bool ok = TryInverseFactor(matrix, relativePivotTolerance, out InverseFactor m);
        d0 = m.Diagonal0;
        d1 = m.Diagonal1;
        d2 = m.Diagonal2;
        d3 = m.Diagonal3;
        return ok;
    }

    /// <summary>M = L⁻¹ of the Cholesky factor L of the lower triangle of <paramref name="a"/>.</summary>
    private static bool TryInverseFactor(ReadOnlySpan<double> a, double relativePivotTolerance, out InverseFactor m)
    {
        m = default;
        ArgumentOutOfRangeException.ThrowIfLessThan(a.Length, 16, nameof(a));
        double a00 = a[0], a10 = a[4], a11 = a[5], a20 = a[8], a21 = a[9], a22 = a[10], a30 = a[12], a31 = a[13], a32 = a[14], a33 = a[15];
        double trace = a00 + a11 + a22 + a33;
        if (!(trace > 0.0) || !double.IsFinite(trace))
        {
            return false;
        }

        // Written as !(d > min) so that NaN also fails.
        double minPivot = relativePivotTolerance * trace;
        double d = a00;
        if (!(d > minPivot))
        {
            return false;
        }

        double l00 = Math.Sqrt(d);
        double l10 = a10 / l00, l20 = a20 / l00, l30 = a30 / l00;
        d = a11 - (l10 * l10);
        if (!(d > minPivot))
        {
            return false;
        }

        double l11 = Math.Sqrt(d);
        double l21 = (a21 - (l20 * l10)) / l11;
        double l31 = (a31 - (l30 * l10)) / l11;
        d = a22 - (l20 * l20) - (l21 * l21);
        if (!(d > minPivot))
        {
            return false;
        }

        double l22 = Math.Sqrt(d);
        double l32 = (a32 - (l30 * l20) - (l31 * l21)) / l22;
        d = a33 - (l30 * l30) - (l31 * l31) - (l32 * l32);
        if (!(d > minPivot))
        {
            return false;
        }

        double l33 = Math.Sqrt(d);

        // Forward substitution, column by column; each sum starts from 0 as in the looped form.
        m.M00 = 1.0 / l00;
        m.M10 = (0.0 - (l10 * m.M00)) / l11;
        m.M20 = (0.0 - (l20 * m.M00) - (l21 * m.M10)) / l22;
        m.M30 = (0.0 - (l30 * m.M00) - (l31 * m.M10) - (l32 * m.M20)) / l33;
        m.M11 = 1.0 / l11;
        m.M21 = (0.0 - (l21 * m.M11)) / l22;
        m.M31 = (0.0 - (l31 * m.M11) - (l32 * m.M21)) / l33;
        m.M22 = 1.0 / l22;
        m.M32 = (0.0 - (l32 * m.M22)) / l33;
        m.M33 = 1.0 / l33;
        return true;
    }

    /// <summary>The lower triangle of M = L⁻¹ and the diagonal of A⁻¹ = MᵀM.</summary>
    private struct InverseFactor
    {
        public double M00, M10, M11, M20, M21, M22, M30, M31, M32, M33;

        public readonly double Diagonal0 => 0.0 + (M00 * M00) + (M10 * M10) + (M20 * M20) + (M30 * M30);

        public readonly double Diagonal1 => 0.0 + (M11 * M11) + (M21 * M21) + (M31 * M31);

        public readonly double Diagonal2 => 0.0 + (M22 * M22) + (M32 * M32);

        public readonly double Diagonal3 => 0.0 + (M33 * M33);
    }
}

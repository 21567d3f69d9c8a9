namespace ErrorBudget.Core.Geometry;

/// <summary>
/// Hand-written 4 × 4 symmetric positive-definite algebra for the hot path (no allocation).
/// Matrices are row-major spans of 16 doubles.
/// </summary>
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
        double trace = matrix[0] + matrix[5] + matrix[10] + matrix[15];
        if (!(trace > 0.0) || !double.IsFinite(trace))
        {
            return false;
        }

        double minPivot = relativePivotTolerance * trace;
        Span<double> l = stackalloc double[16];      // Cholesky factor, lower triangle
        for (int j = 0; j < 4; j++)
        {
            double d = matrix[(j * 4) + j];
            for (int k = 0; k < j; k++)
            {
                d -= l[(j * 4) + k] * l[(j * 4) + k];
            }

            // Written as !(d > min) so that NaN also fails.
            if (!(d > minPivot))
            {
                return false;
            }

            double ljj = Math.Sqrt(d);
            l[(j * 4) + j] = ljj;
            for (int i = j + 1; i < 4; i++)
            {
                double s = matrix[(i * 4) + j];
                for (int k = 0; k < j; k++)
                {
                    s -= l[(i * 4) + k] * l[(j * 4) + k];
                }

                l[(i * 4) + j] = s / ljj;
            }
        }

        // M = L⁻¹ (lower triangular), by forward substitution column by column.
        Span<double> mInv = stackalloc double[16];
        for (int j = 0; j < 4; j++)
        {
            mInv[(j * 4) + j] = 1.0 / l[(j * 4) + j];
            for (int i = j + 1; i < 4; i++)
            {
                double s = 0.0;
                for (int k = j; k < i; k++)
                {
                    s -= l[(i * 4) + k] * mInv[(k * 4) + j];
                }

                mInv[(i * 4) + j] = s / l[(i * 4) + i];
            }
        }

        // A⁻¹ = Mᵀ M; M is lower triangular, so the sum starts at max(r, c).
        for (int r = 0; r < 4; r++)
        {
            for (int c = r; c < 4; c++)
            {
                double s = 0.0;
                for (int k = c; k < 4; k++)
                {
                    s += mInv[(k * 4) + r] * mInv[(k * 4) + c];
                }

                inverse[(r * 4) + c] = s;
                inverse[(c * 4) + r] = s;
            }
        }

        return true;
    }
}

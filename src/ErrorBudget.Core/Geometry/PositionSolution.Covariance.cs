namespace ErrorBudget.Core.Geometry;

public static partial class PositionSolution
{
    /// <summary>Pivots within this fraction of the trace of zero are treated as exactly zero (semi-definite).</summary>
    internal const double SemiDefiniteRelativeTolerance = 1e-12;

    /// <summary>
    /// Covariance of the ENU position error for independent range errors: C = S_enu diag(var) S_enuᵀ.
    /// Does not allocate.
    /// </summary>
    /// <param name="projection">S from <see cref="TrySolve"/>, row-major 4 × m (only the E, N, U rows are read).</param>
    /// <param name="m">Number of satellites (columns of S). Range: m ≥ 0.</param>
    /// <param name="rangeVariances">Variance of each satellite's range error, m². Length ≥ m.</param>
    /// <param name="enuCovariance">Receives the 3 × 3 ENU covariance, row-major, m². Length ≥ 9.</param>
    public static void ProjectCovariance(
        ReadOnlySpan<double> projection, int m, ReadOnlySpan<double> rangeVariances, Span<double> enuCovariance)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(m);
        ArgumentOutOfRangeException.ThrowIfLessThan(projection.Length, 3 * m, nameof(projection));
        ArgumentOutOfRangeException.ThrowIfLessThan(rangeVariances.Length, m, nameof(rangeVariances));
        ArgumentOutOfRangeException.ThrowIfLessThan(enuCovariance.Length, 9, nameof(enuCovariance));

        for (int a = 0; a < 3; a++)
        {
            ReadOnlySpan<double> rowA = projection.Slice(a * m, m);
            for (int b = a; b < 3; b++)
            {
                ReadOnlySpan<double> rowB = projection.Slice(b * m, m);
                double s = 0.0;
                for (int i = 0; i < m; i++)
                {
                    s += rowA[i] * rowB[i] * rangeVariances[i];
                }

                enuCovariance[(a * 3) + b] = s;
                enuCovariance[(b * 3) + a] = s;
            }
        }
    }

    /// <summary>
    /// Lower-triangular Cholesky factor L of a symmetric positive semi-definite 3 × 3 matrix, L Lᵀ = cov3,
    /// e.g. to draw correlated ENU samples. Only the lower triangle of <paramref name="cov3"/> is read.
    /// Pivots within 1e-12 × trace of zero (rounding of a semi-definite matrix) are set to zero together
    /// with the rest of their column. Does not allocate.
    /// </summary>
    /// <param name="cov3">Row-major 3 × 3 covariance. Length ≥ 9.</param>
    /// <param name="lower">Receives L, row-major, zeros above the diagonal. Length ≥ 9.</param>
    /// <returns>False (lower unspecified) when the matrix is not positive semi-definite or not finite.</returns>
    public static bool TryCholesky3(ReadOnlySpan<double> cov3, Span<double> lower)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(cov3.Length, 9, nameof(cov3));
        ArgumentOutOfRangeException.ThrowIfLessThan(lower.Length, 9, nameof(lower));

        double trace = cov3[0] + cov3[4] + cov3[8];
        if (!(trace >= 0.0) || !double.IsFinite(trace))
        {
            return false;
        }

        double tol = SemiDefiniteRelativeTolerance * trace;
        lower[..9].Clear();
        for (int j = 0; j < 3; j++)
        {
            double d = cov3[(j * 3) + j];
            for (int k = 0; k < j; k++)
            {
                d -= lower[(j * 3) + k] * lower[(j * 3) + k];
            }

            if (!(d >= -tol))
            {
                return false;
            }

            if (d <= tol)
            {
                // Zero direction: for a PSD matrix the off-diagonal residuals obey s² ≤ d·dᵢ ≤ tol·trace,
                // so a larger residual means the matrix is indefinite.
                for (int i = j + 1; i < 3; i++)
                {
                    double s = Residual(cov3, lower, i, j);
                    if (s * s > tol * trace)
                    {
                        return false;
                    }
                }

                continue;
            }

            double ljj = Math.Sqrt(d);
            lower[(j * 3) + j] = ljj;
            for (int i = j + 1; i < 3; i++)
            {
                lower[(i * 3) + j] = Residual(cov3, lower, i, j) / ljj;
            }
        }

        return true;
    }

    private static double Residual(ReadOnlySpan<double> cov3, ReadOnlySpan<double> lower, int i, int j)
    {
        double s = cov3[(i * 3) + j];
        for (int k = 0; k < j; k++)
        {
            s -= lower[(i * 3) + k] * lower[(j * 3) + k];
        }

        return s;
    }
}

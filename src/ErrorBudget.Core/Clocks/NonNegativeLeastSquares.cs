using MathNet.Numerics.LinearAlgebra;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Non-negative least squares min ||A x - b||_2 subject to x &gt;= 0, by the active-set method of
/// Lawson &amp; Hanson (Solving Least Squares Problems, 1974, ch. 23). The unconstrained sub-problems on
/// the passive set are solved by MathNet's Householder QR. Meant for small, well-scaled problems
/// (a handful of columns); scale the columns to unit norm before calling.
/// </summary>
internal static class NonNegativeLeastSquares
{
    public static Vector<double> Solve(Matrix<double> a, Vector<double> b)
    {
        int n = a.ColumnCount;
        var x = Vector<double>.Build.Dense(n);
        var passive = new bool[n];
        double tolerance = 1e-12 * Math.Max(1.0, a.FrobeniusNorm() * b.L2Norm());
        int maxOuter = 3 * n + 10;

        for (int outer = 0; outer < maxOuter; outer++)
        {
            var w = a.TransposeThisAndMultiply(b - a * x);
            int best = -1;
            double bestW = tolerance;
            for (int j = 0; j < n; j++)
            {
                if (!passive[j] && w[j] > bestW)
                {
                    bestW = w[j];
                    best = j;
                }
            }

            if (best < 0)
            {
                break;
            }

            passive[best] = true;
            for (int inner = 0; inner < maxOuter; inner++)
            {
                var s = SolvePassive(a, b, passive);
                bool feasible = true;
                for (int j = 0; j < n; j++)
                {
                    if (passive[j] && s[j] <= 0)
                    {
                        feasible = false;
                    }
                }

                if (feasible)
                {
                    x = s;
                    break;
                }

                // Step from x towards s until the first passive variable reaches zero, then drop it.
                double alpha = double.PositiveInfinity;
                for (int j = 0; j < n; j++)
                {
                    if (passive[j] && s[j] <= 0)
                    {
                        alpha = Math.Min(alpha, x[j] / (x[j] - s[j]));
                    }
                }

                x += alpha * (s - x);
                for (int j = 0; j < n; j++)
                {
                    if (passive[j] && x[j] <= tolerance)
                    {
                        passive[j] = false;
                        x[j] = 0;
                    }
                }
            }
        }

        return x;
    }

    private static Vector<double> SolvePassive(Matrix<double> a, Vector<double> b, bool[] passive)
    {
        int n = a.ColumnCount;
        var columns = new List<int>(n);
        for (int j = 0; j < n; j++)
        {
            if (passive[j])
            {
                columns.Add(j);
            }
        }

        var sub = Matrix<double>.Build.Dense(a.RowCount, columns.Count, (i, k) => a[i, columns[k]]);
        var solution = sub.QR().Solve(b);
        var full = Vector<double>.Build.Dense(n);
        for (int k = 0; k < columns.Count; k++)
        {
            full[columns[k]] = solution[k];
        }

        return full;
    }
}

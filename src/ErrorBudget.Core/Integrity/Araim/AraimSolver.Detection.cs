using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Integrity.Araim;

internal sealed partial class AraimSolver
{
    /// <summary>
    /// Solution-separation fault detection and a simple exclusion on one sample of range errors, with the
    /// projections and thresholds of the last successful <see cref="TryEvaluate"/>. Does not allocate.
    /// </summary>
    /// <remarks>
    /// <para>Detection: |x̂_q⁽ᵏ⁾ − x̂_q⁽⁰⁾| &gt; T_k,q for any monitored mode k and axis q (E, N, U), with
    /// x̂⁽ᵏ⁾ = S⁽ᵏ⁾ε (REFERENCE-VALUES §5).</para>
    /// <para>Exclusion (a simplification of the baseline, which re-runs solution separation inside each
    /// candidate subset and recomputes the PLs): candidates are taken in decreasing order of the normalised
    /// separation ν_k = max_q |x̂_q⁽ᵏ⁾ − x̂_q⁽⁰⁾| / T_k,q; the first whose own residual passes the χ² test
    /// Σ_{i∈k} wᵢ (εᵢ − Gᵢ x̂⁽ᵏ⁾)² ≤ χ²⁻¹(1 − P_exclusion; n_k − 4), wᵢ = 1/σ²_int,i, is excluded and its subset
    /// solution is used. The statistic is χ²(n_k − 4) when the errors follow C_int and stochastically smaller
    /// when C_acc ≤ C_int, so P_exclusion bounds the chance of rejecting a fault-free candidate. A subset
    /// without redundancy (n_k = 4) cannot pass. When no candidate passes, the all-in-view solution is kept
    /// and <see cref="DetectionResult.ExclusionFailed"/> is true.</para>
    /// </remarks>
    /// <param name="rangeErrorMeters">εᵢ, the range error of each satellite (same order as the last
    /// TryEvaluate), metres. Length m.</param>
    /// <param name="positionErrorEnu">Receives the E, N, U error of the solution used (all-in-view, or the
    /// excluded subset's), metres. Length ≥ 3.</param>
    /// <exception cref="InvalidOperationException">No successful TryEvaluate yet.</exception>
    /// <exception cref="ArgumentException">The lengths do not match.</exception>
    public DetectionResult Test(ReadOnlySpan<double> rangeErrorMeters, Span<double> positionErrorEnu)
    {
        if (!_evaluated)
        {
            throw new InvalidOperationException("Test needs a successful TryEvaluate first.");
        }

        int m = _m;
        if (rangeErrorMeters.Length != m)
        {
            throw new ArgumentException("One range error per satellite of the last TryEvaluate is needed.", nameof(rangeErrorMeters));
        }

        ArgumentOutOfRangeException.ThrowIfLessThan(positionErrorEnu.Length, Axes, nameof(positionErrorEnu));

        double x0E = Dot(_allInView.AsSpan(0, m), rangeErrorMeters);
        double x0N = Dot(_allInView.AsSpan(m, m), rangeErrorMeters);
        double x0U = Dot(_allInView.AsSpan(2 * m, m), rangeErrorMeters);

        bool detected = false;
        for (int k = 0; k < _modeCount; k++)
        {
            ReadOnlySpan<double> s = _projections.AsSpan(k * _stride, Rows * m);
            Span<double> x = _estimates.AsSpan(k * Rows, Rows);
            for (int r = 0; r < Rows; r++)
            {
                x[r] = Dot(s.Slice(r * m, m), rangeErrorMeters);
            }

            double worst = Normalised(Math.Abs(x[0] - x0E), _threshold[k * Axes], ref detected);
            worst = Math.Max(worst, Normalised(Math.Abs(x[1] - x0N), _threshold[(k * Axes) + 1], ref detected));
            worst = Math.Max(worst, Normalised(Math.Abs(x[2] - x0U), _threshold[(k * Axes) + 2], ref detected));
            _normalizedSeparation[k] = worst;
        }

        if (detected)
        {
            for (int attempt = 0; attempt < _modeCount; attempt++)
            {
                int best = -1;
                double largest = -1.0; // tried candidates are marked −1
                for (int k = 0; k < _modeCount; k++)
                {
                    if (_normalizedSeparation[k] > largest)
                    {
                        largest = _normalizedSeparation[k];
                        best = k;
                    }
                }

                if (best < 0)
                {
                    break;
                }

                _normalizedSeparation[best] = -1.0;
                if (PassesResidualTest(best, rangeErrorMeters))
                {
                    ReadOnlySpan<double> x = _estimates.AsSpan(best * Rows, Rows);
                    positionErrorEnu[0] = x[0];
                    positionErrorEnu[1] = x[1];
                    positionErrorEnu[2] = x[2];
                    return new DetectionResult(true, best);
                }
            }
        }

        positionErrorEnu[0] = x0E;
        positionErrorEnu[1] = x0N;
        positionErrorEnu[2] = x0U;
        return new DetectionResult(detected, -1);
    }

    /// <summary>d/T, and flags a detection when d &gt; T (a zero threshold with d = 0 is no detection).</summary>
    private static double Normalised(double separation, double threshold, ref bool detected)
    {
        if (separation > threshold)
        {
            detected = true;
        }

        return threshold > 0.0 ? separation / threshold : (separation > 0.0 ? double.PositiveInfinity : 0.0);
    }

    /// <summary>The weighted residual χ² test of subset k, using the estimate stored by <see cref="Test"/>.</summary>
    private bool PassesResidualTest(int k, ReadOnlySpan<double> rangeErrorMeters)
    {
        int dof = _modes[k].SatellitesUsed - Rows;
        if (dof < 1)
        {
            return false;
        }

        ReadOnlySpan<double> x = _estimates.AsSpan(k * Rows, Rows);
        double statistic = 0.0;
        for (int i = 0; i < _m; i++)
        {
            if (RemovesUnchecked(k, i))
            {
                continue;
            }

            // Gᵢ = [−e, −n, −u, 1] (PositionSolution's sign convention).
            Vec3 los = _lineOfSight[i];
            double predicted = (-los.X * x[0]) - (los.Y * x[1]) - (los.Z * x[2]) + x[3];
            double residual = rangeErrorMeters[i] - predicted;
            statistic += _weights[i] * residual * residual;
        }

        return statistic <= _chiSquareThreshold[dof];
    }

    private static double Dot(ReadOnlySpan<double> a, ReadOnlySpan<double> b)
    {
        double s = 0.0;
        for (int i = 0; i < a.Length; i++)
        {
            s += a[i] * b[i];
        }

        return s;
    }
}

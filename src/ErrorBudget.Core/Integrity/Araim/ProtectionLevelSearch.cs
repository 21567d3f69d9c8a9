namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>
/// Solves the MHSS integrity-risk equation Σⱼ pⱼ·Q((PL − oⱼ)/σⱼ) = target for PL by half-interval
/// (bisection) search, where term j has prior pⱼ, standard deviation σⱼ and offset oⱼ (threshold plus
/// bias projection; for the fault-free term pⱼ = 2 and oⱼ = b⁽⁰⁾). Allocation-free.
/// </summary>
/// <remarks>
/// Bracket (ARAIM reference airborne algorithm description, protection-level appendix, from memory;
/// REFERENCE-VALUES §5). The left side falls with PL, so:
/// lower = maxⱼ [oⱼ + Q⁻¹(target/pⱼ)·σⱼ] over terms with pⱼ &gt; target (one term alone may not exceed
/// the target); upper = maxⱼ [oⱼ + max(0, Q⁻¹(target/(n·pⱼ)))·σⱼ] (each of the n terms at most target/n).
/// The search stops when upper − lower ≤ tolerance and returns the upper end, so the result lies within
/// the tolerance above the exact root and is never below it.
/// </remarks>
internal static class ProtectionLevelSearch
{
    /// <summary>Safety cap; the bracket halves each time, so 200 steps cover any finite bracket.</summary>
    private const int MaxIterations = 200;

    /// <summary>
    /// The protection level, metres: the upper end of the final bracket, ≥ 0. +∞ when target ≤ 0
    /// (the unmonitored share used up the budget) or the bracket is not finite.
    /// </summary>
    /// <param name="prior">pⱼ ≥ 0 (terms with pⱼ = 0 are ignored).</param>
    /// <param name="sigma">σⱼ &gt; 0, metres.</param>
    /// <param name="offset">oⱼ ≥ 0, metres.</param>
    /// <param name="target">Integrity risk allocated to this axis. Range: target &lt; 1.</param>
    /// <param name="toleranceMeters">Bracket width at which the search stops. Range: &gt; 0.</param>
    public static double Solve(
        ReadOnlySpan<double> prior, ReadOnlySpan<double> sigma, ReadOnlySpan<double> offset, double target, double toleranceMeters)
    {
        if (!(target > 0.0))
        {
            return double.PositiveInfinity;
        }

        int n = 0;
        for (int j = 0; j < prior.Length; j++)
        {
            if (prior[j] > 0.0)
            {
                n++;
            }
        }

        // A protection level is a distance: clamp the lower end at zero.
        double low = 0.0, high = 0.0;
        for (int j = 0; j < prior.Length; j++)
        {
            double p = prior[j];
            if (!(p > 0.0))
            {
                continue;
            }

            double alone = target / p;
            if (alone < 1.0)
            {
                low = Math.Max(low, offset[j] + (GaussianTail.InverseQ(alone) * sigma[j]));
            }

            double share = target / (n * p);
            double k = share < 0.5 ? GaussianTail.InverseQ(share) : 0.0;
            high = Math.Max(high, offset[j] + (k * sigma[j]));
        }

        if (!double.IsFinite(high))
        {
            return double.PositiveInfinity;
        }

        for (int iteration = 0; iteration < MaxIterations && high - low > toleranceMeters; iteration++)
        {
            double mid = 0.5 * (low + high);
            if (Risk(prior, sigma, offset, mid) > target)
            {
                low = mid;
            }
            else
            {
                high = mid;
            }
        }

        return high;
    }

    /// <summary>Σⱼ pⱼ·Q((pl − oⱼ)/σⱼ), the integrity risk at protection level <paramref name="pl"/>.</summary>
    public static double Risk(ReadOnlySpan<double> prior, ReadOnlySpan<double> sigma, ReadOnlySpan<double> offset, double pl)
    {
        double risk = 0.0;
        for (int j = 0; j < prior.Length; j++)
        {
            if (prior[j] > 0.0)
            {
                risk += prior[j] * GaussianTail.Q((pl - offset[j]) / sigma[j]);
            }
        }

        return risk;
    }
}

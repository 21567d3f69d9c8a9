using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Integrity;

/// <summary>
/// The CDF overbounding check of a distribution of normalized errors x = e / sigma_assumed against the
/// zero-mean Gaussian N(0, k^2): the smallest inflation k of the assumed sigma that overbounds.
/// </summary>
/// <remarks>
/// <para><b>Definition</b> (B. DeCleene, "Defining pseudorange integrity - overbounding", ION GPS 2000):
/// G overbounds F when G(x) &gt;= F(x) for all x &lt;= 0 and G(x) &lt;= F(x) for all x &gt;= 0 (from memory,
/// as the definition is commonly restated; not checked against the paper here). With
/// G(x) = Phi(x / k) and Phi monotone this is x / k &gt;= Phi^-1(F(x)) for x &lt; 0 and x / k &lt;= Phi^-1(F(x))
/// for x &gt; 0; both read k &gt;= k(x) = x / Phi^-1(F(x)) when Phi^-1(F(x)) has the sign of x. When it
/// has the other sign (F(x) &gt; 1/2 at some x &lt; 0, or F(x) &lt; 1/2 at some x &gt; 0) no k works:
/// the median lies on the wrong side of 0, k = +infinity. x = 0 itself (it only says "median 0") is not
/// evaluated.</para>
/// <para><b>Estimate.</b> k = max over the evaluated bin edges x_i of x_i / Phi^-1(F_n(x_i)), with
/// F_n(x_i) = L_i / n the fraction of samples below the edge (underflow included). Between edges nothing
/// is checked (edges are 1/64 sigma apart by default).</para>
/// <para><b>Finite-sample rule.</b> F_n(x) has binomial noise of standard deviation
/// s = sqrt(F (1 - F) / n). Through q = Phi^-1(F) (dq / dF = 1 / phi(q)) the ratio k(x) = x / q gets the
/// relative standard error rho(x) = s / (phi(q) |q|) (delta method; it needs no model of the truth).
/// rho is large in two places: near x = 0, where q -&gt; 0 (rho ~ 1.25 / (sqrt(n) |q|)), and in the far
/// tail, where a handful of samples decide F (rho ~ 1 / (q^2 sqrt(m)) for m samples beyond x). An edge is
/// evaluated only when
/// (1) its tail holds m = min(L_i, n - L_i) &gt;= minTailCount samples (default 20: below that the
/// Poisson count is too coarse for the delta method; the brief's m_min/n tail-mass rule), and
/// (2) rho(x_i), computed from F_n, is at most maxRelativeError (default 0.01).
/// Near 0, (2) is the test |F - 1/2| &gt; z s with z ~ 1 / maxRelativeError = 100; a z of about 3 would
/// leave 1/3 relative noise in k at the first edges, and the maximum over edges would pick it up. The
/// checked range grows with n on both sides: at n = 1e6 it spans about 0.13 &lt;= |x| &lt;= 4 sigma (tail mass
/// down to ~4e-5); at n = 1e5 about 0.4 to 3 sigma; below about n = 1.6e4 (where the best rho, 1.28 / sqrt(n)
/// at |q| = 1.57, exceeds 0.01) nothing is evaluated and the result is NaN. Rule (2) also makes the "wrong
/// side" verdict safe: it needs |F - 1/2| of about 100 s.</para>
/// <para><b>Tolerance.</b> Each k_i is within k_i (1 +- tau) except with probability Q(tau / rho_i); the
/// reported tau solves sum_i Q(tau / rho_i) = <see cref="ToleranceFalseAlarm"/> over the evaluated edges
/// (union bound, so conservative: neighbouring edges share most samples). Then the maximum is within a
/// factor 1 +- tau of the population maximum over those edges with probability &gt;= 1 - 2e-3. With every
/// rho_i &lt;= 0.01 and at most 1537 edges, tau &lt;= 0.01 Phi^-1(1 - 1e-3 / 1537) = 0.048.</para>
/// </remarks>
internal static class OverboundAnalysis
{
    /// <summary>The default smallest number of samples in the tail beyond an evaluated edge.</summary>
    public const int DefaultMinTailCount = 20;

    /// <summary>The default largest relative standard error rho of k at an evaluated edge.</summary>
    public const double DefaultMaxRelativeError = 0.01;

    /// <summary>The one-sided family-wise false-alarm probability behind <see cref="OverboundResult.SamplingTolerance"/>.</summary>
    public const double ToleranceFalseAlarm = 1e-3;

    /// <summary>
    /// The required inflation of the histogram's distribution (see the remarks for the rule).
    /// Range: minTailCount &gt;= 1; 0 &lt; maxRelativeError &lt;= 1.
    /// </summary>
    public static OverboundResult RequiredInflation(
        OverboundHistogram histogram,
        int minTailCount = DefaultMinTailCount,
        double maxRelativeError = DefaultMaxRelativeError)
    {
        ArgumentNullException.ThrowIfNull(histogram);
        ArgumentOutOfRangeException.ThrowIfLessThan(minTailCount, 1);
        if (!(maxRelativeError > 0.0 && maxRelativeError <= 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(maxRelativeError), maxRelativeError, "Must be in (0, 1].");
        }

        long n = histogram.Count;
        var rhos = new List<double>();
        double worst = double.NaN, criticalX = double.NaN;
        double lowerTail = 0.5, upperTail = 0.5;
        long below = histogram.Underflow;
        for (int i = 0; i <= histogram.BinCount; i++)
        {
            if (i > 0)
            {
                below += histogram.CountOf(i - 1);
            }

            double x = histogram.Edge(i);
            long tailCount = Math.Min(below, n - below);
            if (x == 0.0 || tailCount < minTailCount)
            {
                continue;
            }

            double f = (double)below / n;
            double q = Normal.InvCDF(0.0, 1.0, f);
            double rho = Math.Sqrt(f * (1.0 - f) / n) / (Normal.PDF(0.0, 1.0, q) * Math.Abs(q));
            if (!(rho <= maxRelativeError))
            {
                continue; // also q = 0 (F exactly 1/2): rho infinite
            }

            rhos.Add(rho);
            double k = (x < 0.0) == (q < 0.0) ? x / q : double.PositiveInfinity;
            if (!(k <= worst))
            {
                worst = k;
                criticalX = x;
            }

            double tail = (double)tailCount / n;
            if (x < 0.0)
            {
                lowerTail = Math.Min(lowerTail, tail);
            }
            else
            {
                upperTail = Math.Min(upperTail, tail);
            }
        }

        bool any = rhos.Count > 0;
        return new OverboundResult(
            Samples: n,
            Mean: histogram.Mean,
            SigmaRatio: histogram.StandardDeviation,
            RequiredInflation: worst,
            TailProbabilityChecked: any ? Math.Max(lowerTail, upperTail) : double.NaN,
            Bounded: worst <= 1.0,
            SamplingTolerance: any ? Tolerance(rhos) : double.NaN,
            CriticalX: criticalX,
            EvaluatedEdges: rhos.Count);
    }

    /// <summary>tau with sum_i Q(tau / rho_i) = ToleranceFalseAlarm, by bisection (the sum falls with tau).</summary>
    private static double Tolerance(List<double> rhos)
    {
        double rhoMax = 0.0;
        foreach (double r in rhos)
        {
            rhoMax = Math.Max(rhoMax, r);
        }

        // At tau = rhoMax z, z = Phi^-1(1 - alpha / N), every term is at most alpha / N: an upper bracket.
        double lo = 0.0, hi = rhoMax * -Normal.InvCDF(0.0, 1.0, ToleranceFalseAlarm / rhos.Count);
        for (int iteration = 0; iteration < 60; iteration++)
        {
            double mid = 0.5 * (lo + hi);
            double sum = 0.0;
            foreach (double r in rhos)
            {
                sum += Normal.CDF(0.0, 1.0, -mid / r);
            }

            if (sum > ToleranceFalseAlarm)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return hi;
    }
}

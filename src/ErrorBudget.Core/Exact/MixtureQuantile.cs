using MathNet.Numerics.RootFinding;

namespace ErrorBudget.Core.Exact;

/// <summary>
/// Quantiles of a weighted mixture of position-error distributions, by Brent's method on the mixture
/// CDF between the smallest and largest component quantile (the mixture's quantile lies between them).
/// </summary>
internal static class MixtureQuantile
{
    /// <summary>Relative accuracy of the root, well inside the sketch's 0.5 %.</summary>
    public const double RelativeAccuracy = 1e-7;

    /// <summary>Stopping accuracy handed to Brent (it bounds |F(x) - level| and half the x step).</summary>
    public const double FunctionAccuracy = 1e-12;

    public static double Solve(Func<double, double> mixtureCdf, double level, double lower, double upper)
    {
        if (!(upper > 0) || !double.IsFinite(upper))
        {
            return double.NaN;
        }

        if (upper <= lower * (1 + RelativeAccuracy))
        {
            return 0.5 * (lower + upper);
        }

        // MathNet's Brent also stops as soon as |f| < accuracy, and f is a probability here: the accuracy
        // must be far below the smallest tail probability (1e-3 at p99.9), or a wide bracket ends early
        // (found when the mixture p99.9 of a near-singular geometry came out twice the sampled one).
        return Brent.FindRoot(x => mixtureCdf(x) - level, lower, upper, FunctionAccuracy, 400);
    }

    /// <summary>Quantile of the standard half-normal, sigma = 1: Phi^-1((1 + p) / 2).</summary>
    public static double HalfNormal(double p) => MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, 0.5 * (1 + p));

    /// <summary>Quantile of the unit Rayleigh: sqrt(-2 ln(1 - p)).</summary>
    public static double Rayleigh(double p) => Math.Sqrt(-2.0 * Math.Log(1 - p));
}

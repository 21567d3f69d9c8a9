namespace ErrorBudget.Core.Exact;

/// <summary>
/// Quantiles of a weighted mixture of position-error distributions, by the Illinois method on the mixture
/// CDF between the smallest and largest component quantile (the mixture's quantile lies between them).
/// </summary>
internal static class MixtureQuantile
{
    /// <summary>Relative accuracy of the root, well inside the sketch's 0.5 %.</summary>
    public const double RelativeAccuracy = 1e-6;

    /// <summary>Iteration cap (Illinois converges superlinearly: about 10 iterations here).</summary>
    private const int MaxIterations = 200;

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

        // Illinois (modified false position, Dowell & Jarratt, BIT 11, 1971, from memory; common practice): keeps a bracket, so the
        // stopping rule is on x alone (bracket width <= RelativeAccuracy x upper end). MathNet's Brent was
        // tried first: it also stops once |F(x) - level| is below its accuracy, which for a wide bracket put
        // the p99.9 of near-singular geometries 74 % too high.
        double a = lower, b = upper;
        double fa = mixtureCdf(a) - level, fb = mixtureCdf(b) - level;
        if (fa >= 0)
        {
            return a;
        }

        if (fb <= 0)
        {
            return b;
        }

        int side = 0;
        for (int iteration = 0; iteration < MaxIterations && b - a > RelativeAccuracy * b; iteration++)
        {
            double c = ((a * fb) - (b * fa)) / (fb - fa);
            if (!(c > a && c < b))
            {
                c = 0.5 * (a + b);
            }

            double fc = mixtureCdf(c) - level;
            if (fc == 0)
            {
                return c;
            }

            if (fc < 0)
            {
                a = c;
                fa = fc;
                fb = side == -1 ? fb * 0.5 : fb; // Illinois: halve the stale end's value
                side = -1;
            }
            else
            {
                b = c;
                fb = fc;
                fa = side == 1 ? fa * 0.5 : fa;
                side = 1;
            }
        }

        return 0.5 * (a + b);
    }

    /// <summary>Quantile of the standard half-normal, sigma = 1: Phi^-1((1 + p) / 2).</summary>
    public static double HalfNormal(double p) => MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, 0.5 * (1 + p));

    /// <summary>Quantile of the unit Rayleigh: sqrt(-2 ln(1 - p)).</summary>
    public static double Rayleigh(double p) => Math.Sqrt(-2.0 * Math.Log(1 - p));
}

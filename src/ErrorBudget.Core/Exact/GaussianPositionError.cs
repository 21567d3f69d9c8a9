using MathNet.Numerics;

namespace ErrorBudget.Core.Exact;

/// <summary>
/// Distribution functions of the position error of one (epoch, user) when its ENU error is a zero-mean
/// Gaussian: VPE = |U| is a folded (half-) normal, HPE = |(E, N)| the norm of a 2-D Gaussian with
/// eigenvalues lambda1 &gt;= lambda2 of its covariance.
/// </summary>
internal static class GaussianPositionError
{
    /// <summary>P(|U| &lt;= x) = erf(x / (sigma sqrt 2)) (half-normal; common practice).</summary>
    public static double VerticalCdf(double x, double sigma) =>
        sigma > 0 ? SpecialFunctions.Erf(x / (sigma * Math.Sqrt(2.0))) : (x >= 0 ? 1.0 : 0.0);

    /// <summary>
    /// P(|(E, N)| &lt;= r) for covariance eigenvalues lambda1 &gt;= lambda2 &gt;= 0. In polar coordinates the
    /// Gaussian density integrates over the radius in closed form; with the angle taken along the ellipse
    /// (tan t = sqrt(lambda2 / lambda1) tan phi) what is left is
    /// P(R &gt; r) = (2 / pi) Int_0^(pi/2) exp(-r^2 / (2 s^2(phi))) d phi, s^2 = lambda1 cos^2 phi + lambda2 sin^2 phi
    /// (derived here; it reduces to the Rayleigh exp(-r^2 / (2 lambda)) when lambda1 = lambda2, and to the
    /// half-normal of a line when lambda2 = 0). The integrand is smooth and bounded for every eccentricity,
    /// so the midpoint rule with <paramref name="nodes"/> points converges fast.
    /// </summary>
    public static double HorizontalCdf(double r, double lambda1, double lambda2, int nodes)
    {
        if (r <= 0)
        {
            return 0.0;
        }

        if (nodes == LineNodes)
        {
            return ElongatedCdf(r, lambda1, lambda2);
        }

        double half = -0.5 * r * r, sum = 0.0;
        double[] sin2 = SineSquares(nodes);
        for (int k = 0; k < sin2.Length; k++)
        {
            double s2 = lambda1 + ((lambda2 - lambda1) * sin2[k]);
            sum += Math.Exp(half / s2);
        }

        return Math.Clamp(1.0 - (sum / nodes), 0.0, 1.0);
    }

    /// <summary>Marks a very elongated ellipse (ratio &gt;= 100): <see cref="ElongatedCdf"/> takes it.</summary>
    public const int LineNodes = -1;

    private static readonly MathNet.Numerics.Integration.GaussLegendreRule QuarterTurn = new(0.0, Math.PI / 2, 64);

    /// <summary>
    /// The same probability for a very elongated ellipse, where the angular form above concentrates in
    /// a band of width r / sqrt(lambda1): conditioning on the long axis, X = r sin t,
    /// P = 2 Int_0^(pi/2) phi(r sin t / sqrt(lambda1)) / sqrt(lambda1) erf(r cos t / sqrt(2 lambda2)) r cos t dt,
    /// smooth except within lambda2 / r of t = pi/2, where the weight r cos t is already small
    /// (64-point Gauss-Legendre).
    /// </summary>
    private static double ElongatedCdf(double r, double lambda1, double lambda2)
    {
        double sigma1 = Math.Sqrt(lambda1);
        double inverseShort = lambda2 > 0 ? 1.0 / Math.Sqrt(2.0 * lambda2) : double.PositiveInfinity;
        double sum = 0.0;
        for (int k = 0; k < QuarterTurn.Order; k++)
        {
            double t = QuarterTurn.Abscissas[k];
            double x = r * Math.Sin(t) / sigma1;
            double c = r * Math.Cos(t);
            double inner = double.IsPositiveInfinity(inverseShort) ? 1.0 : SpecialFunctions.Erf(c * inverseShort);
            sum += QuarterTurn.Weights[k] * Math.Exp(-0.5 * x * x) * inner * c;
        }

        return Math.Clamp(2.0 * sum / (sigma1 * Math.Sqrt(2.0 * Math.PI)), 0.0, 1.0);
    }

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<int, double[]> Tables = new();

    /// <summary>sin^2 at the midpoint nodes (k + 1/2) pi / (2 n), computed once per node count.</summary>
    private static double[] SineSquares(int nodes) => Tables.GetOrAdd(nodes, n =>
    {
        var table = new double[n];
        for (int k = 0; k < n; k++)
        {
            double sin = Math.Sin((k + 0.5) * Math.PI / 2 / n);
            table[k] = sin * sin;
        }

        return table;
    });

    /// <summary>
    /// Midpoint nodes for an eigenvalue ratio (1e-9 in the CDF), or <see cref="LineNodes"/> for the
    /// elongated form at ratios of 100 and more (1e-7): tested against fine references up to ratio 1e8.
    /// </summary>
    public static int NodesFor(double lambda1, double lambda2)
    {
        double ratio = lambda1 / Math.Max(lambda2, lambda1 * 1e-300);
        return ratio < 2 ? 8 : ratio < 10 ? 16 : ratio < 100 ? 32 : LineNodes;
    }

    /// <summary>Eigenvalues (lambda1 &gt;= lambda2) of the 2 x 2 symmetric [[ee, en], [en, nn]].</summary>
    public static (double Lambda1, double Lambda2) Eigenvalues(double ee, double en, double nn)
    {
        double mean = 0.5 * (ee + nn);
        double d = Math.Sqrt((0.25 * (ee - nn) * (ee - nn)) + (en * en));
        return (mean + d, Math.Max(mean - d, mean * 1e-12));
    }
}

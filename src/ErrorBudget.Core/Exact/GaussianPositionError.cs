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
    /// P(|(E, N)| &lt;= r) for covariance eigenvalues lambda1 &gt;= lambda2 &gt; 0. In polar coordinates the
    /// Gaussian density integrates over the radius in closed form, leaving
    /// P(R &gt; r) = 1 / (2 pi sqrt(lambda1 lambda2)) Int_0^2pi exp(-r^2 q(t) / 2) / q(t) dt,
    /// q(t) = cos^2 t / lambda1 + sin^2 t / lambda2 (derived here; it reduces to the Rayleigh
    /// exp(-r^2 / (2 lambda)) when lambda1 = lambda2). The integrand is smooth and periodic, so the
    /// midpoint rule converges geometrically; <paramref name="nodes"/> points over a quarter period.
    /// </summary>
    public static double HorizontalCdf(double r, double lambda1, double lambda2, int nodes)
    {
        if (r <= 0)
        {
            return 0.0;
        }

        double a = 1.0 / lambda1, b = 1.0 / lambda2, half = -0.5 * r * r, sum = 0.0;
        double step = Math.PI / 2 / nodes;
        double[] sin2 = SineSquares(nodes);
        for (int k = 0; k < sin2.Length; k++)
        {
            double q = a + ((b - a) * sin2[k]);
            sum += Math.Exp(half * q) / q;
        }

        double tail = sum * step * 4.0 / (2.0 * Math.PI * Math.Sqrt(lambda1 * lambda2));
        return Math.Clamp(1.0 - tail, 0.0, 1.0);
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

    /// <summary>Midpoint nodes for an eigenvalue ratio: enough for 1e-10 in the CDF (tested against a 4096-node reference).</summary>
    public static int NodesFor(double lambda1, double lambda2)
    {
        double ratio = lambda1 / lambda2;
        return ratio < 2 ? 8 : ratio < 10 ? 16 : ratio < 50 ? 32 : ratio < 400 ? 96 : 256;
    }

    /// <summary>Eigenvalues (lambda1 &gt;= lambda2) of the 2 x 2 symmetric [[ee, en], [en, nn]].</summary>
    public static (double Lambda1, double Lambda2) Eigenvalues(double ee, double en, double nn)
    {
        double mean = 0.5 * (ee + nn);
        double d = Math.Sqrt((0.25 * (ee - nn) * (ee - nn)) + (en * en));
        return (mean + d, Math.Max(mean - d, mean * 1e-12));
    }
}

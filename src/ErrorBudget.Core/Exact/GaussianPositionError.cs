using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Exact;

/// <summary>
/// Distribution functions of the position error of one (epoch, user) when its ENU error is a zero-mean
/// Gaussian: VPE = |U| is a folded (half-) normal, HPE = |(E, N)| the norm of a 2-D Gaussian with
/// eigenvalues lambda1 &gt;= lambda2 of its covariance. The forms with a mean are in the Offset part.
/// </summary>
internal static partial class GaussianPositionError
{
    /// <summary>P(|U| &lt;= x) = erf(x / (sigma sqrt 2)) (half-normal; common practice), erf from <see cref="TaylorErf"/>.</summary>
    public static double VerticalCdf(double x, double sigma) =>
        sigma > 0 ? TaylorErf.Of(x / (sigma * Math.Sqrt(2.0))) : (x >= 0 ? 1.0 : 0.0);

    /// <summary>
    /// P(|(E, N)| &lt;= r) for covariance eigenvalues lambda1 &gt;= lambda2 &gt;= 0. In polar coordinates the
    /// Gaussian density integrates over the radius in closed form; with the angle taken along the ellipse
    /// (tan t = sqrt(lambda2 / lambda1) tan phi) what is left is
    /// P(R &gt; r) = (2 / pi) Int_0^(pi/2) exp(-r^2 / (2 s^2(phi))) d phi, s^2 = lambda1 cos^2 phi + lambda2 sin^2 phi
    /// (derived here; it reduces to the Rayleigh exp(-r^2 / (2 lambda)) when lambda1 = lambda2, and to the
    /// half-normal of a line when lambda2 = 0). The integrand is smooth and bounded for every eccentricity,
    /// so the midpoint rule with <paramref name="nodes"/> points converges fast.
    /// </summary>
    // AggressiveOptimization: a method calling Vector256.Exp can stay slow under tiered compilation (REFERENCE.md).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
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
        int k = 0;
        if (Vector256.IsHardwareAccelerated && sin2.Length >= Vector256<double>.Count)
        {
            // Four nodes per vector exp (the exact path evaluates this for every component at every
            // root-finding step: the scalar exp was 40 % of a W1 --exact run).
            var first = Vector256.Create(lambda1);
            var spread = Vector256.Create(lambda2 - lambda1);
            var exponent = Vector256.Create(half);
            var floor = Vector256.Create(ExpFloor);
            var acc = Vector256<double>.Zero;
            ref double t = ref MemoryMarshal.GetArrayDataReference(sin2);
            for (; k + Vector256<double>.Count <= sin2.Length; k += Vector256<double>.Count)
            {
                var s2 = first + (spread * Vector256.LoadUnsafe(ref t, (nuint)k));
                acc += Vector256.Exp(Vector256.Max(exponent / s2, floor));
            }

            sum = Vector256.Sum(acc);
        }

        for (; k < sin2.Length; k++)
        {
            double s2 = lambda1 + ((lambda2 - lambda1) * sin2[k]);
            sum += Math.Exp(Math.Max(half / s2, ExpFloor));
        }

        return Math.Clamp(1.0 - (sum / nodes), 0.0, 1.0);
    }

    /// <summary>Marks a very elongated ellipse (ratio &gt;= 100): <see cref="ElongatedCdf"/> takes it.</summary>
    public const int LineNodes = -1;

    // 64-point Gauss-Legendre nodes and weights, copied out once: MathNet's GaussLegendreRule returns a
    // fresh copy of its arrays on every Abscissas or Weights access (1 KB per node read here, which made
    // the elongated form allocate 68 KB per call; measured 2026-12-03).
    private static readonly MathNet.Numerics.Integration.GaussLegendreRule QuarterTurnRule = new(0.0, Math.PI / 2, 64);
    private static readonly double[] QuarterWeights = QuarterTurnRule.Weights;
    private static readonly double[] QuarterSin = [.. QuarterTurnRule.Abscissas.Select(Math.Sin)];
    private static readonly double[] QuarterCos = [.. QuarterTurnRule.Abscissas.Select(Math.Cos)];
    private static readonly MathNet.Numerics.Integration.GaussLegendreRule UnitIntervalRule = new(0.0, 1.0, 64);
    private static readonly double[] UnitNodes = UnitIntervalRule.Abscissas;
    private static readonly double[] UnitWeights = UnitIntervalRule.Weights;

    /// <summary>
    /// Long-axis half-width, in sigma1, beyond which the long-axis density is dropped:
    /// 2 Q(10) = 1.5e-23 of probability (common practice for Gaussian tails).
    /// </summary>
    private const double LongAxisCutoff = 10.0;

    /// <summary>
    /// Exponents below this are taken at it (exp = 3.3e-308, nothing beside the terms that matter): the
    /// underflowing exp went through glibc's error path and the vector exp's scalar fallback, about a
    /// tenth of a degenerate --exact run's profile (6.6 % and 3.1 %, perf, 2026-12-03).
    /// </summary>
    private const double ExpFloor = -708.0;

    /// <summary>
    /// The same probability for a very elongated ellipse, where the angular form above concentrates in
    /// a band of width r / sqrt(lambda1): conditioning on the long axis (coordinate x, density
    /// phi(x / sigma1) / sigma1), P = 2 Int_0^r phi(x / sigma1) / sigma1 erf(sqrt(r^2 - x^2) / sqrt(2 lambda2)) dx.
    /// For r within 10 sigma1 it is taken with x = r sin t (t in [0, pi/2], which removes the square-root
    /// end at x = r), smooth except within lambda2 / r of t = pi/2, where the weight r cos t is already
    /// small; beyond, over x in [0, 10 sigma1] directly, where the square root stays away from zero
    /// (64-point Gauss-Legendre both ways). The t-form alone put all its nodes where the long-axis
    /// density is nil once r passed a few hundred sigma1 (r = 35,000 sigma1: 2e-78 for 1) and made the
    /// far-tail percentiles of degenerate geometries return the bracket's end (found 2026-12-03, W1 with a
    /// 40 deg mask).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static double ElongatedCdf(double r, double lambda1, double lambda2)
    {
        double sigma1 = Math.Sqrt(lambda1);
        double inverseShort = lambda2 > 0 ? 1.0 / Math.Sqrt(2.0 * lambda2) : double.PositiveInfinity;
        double sum = 0.0;
        if (r <= LongAxisCutoff * sigma1)
        {
            // The long-axis Gaussians of the 64 nodes first, four per Vector256.Exp, then the erf of each.
            Span<double> gauss = stackalloc double[QuarterWeights.Length];
            double scale = r / sigma1;
            int k = 0;
            if (Vector256.IsHardwareAccelerated)
            {
                var s = Vector256.Create(scale);
                var minusHalf = Vector256.Create(-0.5);
                var floor = Vector256.Create(ExpFloor);
                ref double sin = ref MemoryMarshal.GetArrayDataReference(QuarterSin);
                ref double w = ref MemoryMarshal.GetArrayDataReference(QuarterWeights);
                for (; k + Vector256<double>.Count <= gauss.Length; k += Vector256<double>.Count)
                {
                    var x = s * Vector256.LoadUnsafe(ref sin, (nuint)k);
                    var e = Vector256.Exp(Vector256.Max(minusHalf * x * x, floor));
                    (Vector256.LoadUnsafe(ref w, (nuint)k) * e).CopyTo(gauss[k..]);
                }
            }

            for (; k < gauss.Length; k++)
            {
                double x = scale * QuarterSin[k];
                gauss[k] = QuarterWeights[k] * Math.Exp(Math.Max(-0.5 * x * x, ExpFloor));
            }

            for (k = 0; k < gauss.Length; k++)
            {
                if (gauss[k] > NegligibleTerm)
                {
                    double c = r * QuarterCos[k];
                    sum += gauss[k] * ShortAxisErf(c * inverseShort) * c;
                }
            }

            return Math.Clamp(2.0 * sum / (sigma1 * Math.Sqrt(2.0 * Math.PI)), 0.0, 1.0);
        }

        // Beyond 10 sigma1 the nodes sit at fixed multiples of sigma1: their Gaussians are a table.
        double width = LongAxisCutoff * sigma1;
        for (int k = 0; k < UnitGauss.Length; k++)
        {
            double x = width * UnitNodes[k];
            sum += UnitGauss[k] * ShortAxisErf(Math.Sqrt((r * r) - (x * x)) * inverseShort);
        }

        return Math.Clamp(2.0 * sum * width / (sigma1 * Math.Sqrt(2.0 * Math.PI)), 0.0, 1.0);
    }

    /// <summary>Weight x long-axis Gaussian of the x-form's nodes (x = 10 sigma1 u_k, so z = 10 u_k).</summary>
    private static readonly double[] UnitGauss =
        [.. UnitNodes.Select((u, k) => UnitWeights[k] * Math.Exp(-0.5 * (LongAxisCutoff * u) * (LongAxisCutoff * u)))];

    /// <summary>A node whose weighted Gaussian is below this adds nothing a double sum of O(1) could hold.</summary>
    private const double NegligibleTerm = 1e-300;

    /// <summary>erf of the short-axis argument: the table form (MathNet's erf was over a third of a degenerate run).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double ShortAxisErf(double a) => TaylorErf.Of(a);

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<int, double[]> Tables = new();

    // The node counts NodesFor chooses, without a dictionary lookup per call (5 % of a W1 --exact run's profile).
    private static readonly double[] Sin2Of8 = SineSquareTable(8);
    private static readonly double[] Sin2Of16 = SineSquareTable(16);
    private static readonly double[] Sin2Of32 = SineSquareTable(32);

    /// <summary>sin^2 at the midpoint nodes (k + 1/2) pi / (2 n), computed once per node count.</summary>
    private static double[] SineSquares(int nodes) => nodes switch
    {
        8 => Sin2Of8,
        16 => Sin2Of16,
        32 => Sin2Of32,
        _ => Tables.GetOrAdd(nodes, SineSquareTable),
    };

    private static double[] SineSquareTable(int n)
    {
        var table = new double[n];
        for (int k = 0; k < n; k++)
        {
            double sin = Math.Sin((k + 0.5) * Math.PI / 2 / n);
            table[k] = sin * sin;
        }

        return table;
    }

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

using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Exact;

/// <summary>
/// The distribution functions of a Gaussian position error with a known mean (a deterministic range bias
/// through S: a relativistic term missed or mis-set). VPE is a folded normal; HPE the norm of a 2-D
/// Gaussian with a mean, taken in the frame of its covariance's eigenvectors.
/// </summary>
internal static partial class GaussianPositionError
{
    /// <summary>
    /// P(|U| &lt;= x) for U ~ N(mu, sigma^2): Phi((x - mu) / sigma) - Phi((-x - mu) / sigma), the folded
    /// normal (Leone, Nelson &amp; Nottingham, Technometrics 3, 1961, from memory; common practice). Equals
    /// <see cref="VerticalCdf(double, double)"/> bit for bit when |mu| &lt;= 1e-6 sigma (see NegligibleMean).
    /// </summary>
    public static double VerticalCdf(double x, double sigma, double mu)
    {
        if (Math.Abs(mu) <= NegligibleMean * sigma)
        {
            return VerticalCdf(x, sigma);
        }

        if (x <= 0)
        {
            return 0.0;
        }

        if (!(sigma > 0))
        {
            return Math.Abs(mu) <= x ? 1.0 : 0.0;
        }

        double k = 1.0 / (sigma * Math.Sqrt(2.0));
        return Math.Clamp(0.5 * (TaylorErf.Of((x - mu) * k) + TaylorErf.Of((x + mu) * k)), 0.0, 1.0);
    }

    /// <summary>
    /// P(|(E, N)| &lt;= r) for a horizontal error with covariance eigenvalues lambda1 &gt;= lambda2 and mean
    /// (m1, m2) along their eigenvectors; <see cref="HorizontalCdf(double, double, double, int)"/> (with
    /// <paramref name="nodes"/>) when the mean is negligible (at most 1e-6 of sqrt(lambda2)).
    /// </summary>
    /// <remarks>
    /// Conditioned on the short axis y ~ N(m2, lambda2): P = Int phi((y - m2) / s2) / s2 G(sqrt(r^2 - y^2)) dy
    /// over |y| &lt;= r, with G(a) = P(|x| &lt;= a) for x ~ N(m1, lambda1) the folded normal above (derived here:
    /// the disc's chord at height y has half-length sqrt(r^2 - y^2)). The short axis carries the narrower
    /// density, so the integrand is resolved by the nodes that resolve that density, and G, which varies on
    /// the longer scale s1, is smooth beside it. With y = r sin t (the square-root ends at y = +-r become
    /// smooth) the integral runs over the t of the window m2 +- 10 s2 (2 Q(10) = 1.5e-23 of the density
    /// left out), in panels of 16-point Gauss-Legendre no wider than a quarter of the window nor than
    /// four t-scales of G's steps, s1 / (r max|sin t|).
    /// </remarks>
    // AggressiveOptimization: under tiered compilation (the test host) this loop stayed slow for minutes
    // (relativity-two-shells --exact: 2 min against 18 s with the JIT's tiers off), as REFERENCE.md warns.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static double HorizontalCdf(double r, double lambda1, double lambda2, double m1, double m2, int nodes) =>
        HorizontalCdf(r, lambda1, lambda2, m1, m2, nodes, VectorOffsetForm);

    /// <summary>
    /// <see cref="HorizontalCdf(double, double, double, double, double, int)"/> with the panels' form chosen:
    /// four nodes per Vector256 (needs <see cref="VectorOffsetForm"/> hardware) or one at a time. A
    /// parameter, not a switch, so a test comparing the two cannot disturb runs beside it.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static double HorizontalCdf(double r, double lambda1, double lambda2, double m1, double m2, int nodes, bool vector)
    {
        if ((m1 * m1) + (m2 * m2) <= NegligibleMean * NegligibleMean * lambda2)
        {
            return HorizontalCdf(r, lambda1, lambda2, nodes);
        }

        if (r <= 0)
        {
            return 0.0;
        }

        // Reflections of either axis leave the disc and the distribution's shape alone.
        m1 = Math.Abs(m1);
        m2 = Math.Abs(m2);
        double s1 = Math.Sqrt(lambda1), s2 = Math.Sqrt(lambda2);
        // Far from the mean's distance d the answer is 0 or 1 to 2e-22: | |m + x| - d | <= |x|, and
        // P(|x| > 10 s1) <= exp(-50) for a 2-D Gaussian of largest variance lambda1 (chi-square, 2 degrees
        // of freedom). Most of a mixture's components sit there once the root finder has narrowed in.
        double distance = Math.Sqrt((m1 * m1) + (m2 * m2));
        if (r >= distance + (OffsetWindow * s1))
        {
            return 1.0;
        }

        if (r <= distance - (OffsetWindow * s1))
        {
            return 0.0;
        }

        double yLow = m2 - (OffsetWindow * s2), yHigh = m2 + (OffsetWindow * s2);
        if (yLow >= r)
        {
            return 0.0; // the whole short-axis density lies beyond the disc
        }

        double tLow = Math.Asin(Math.Max(-1.0, yLow / r));
        double tHigh = Math.Asin(Math.Min(1.0, yHigh / r));
        double width = tHigh - tLow;
        if (!(width > 0))
        {
            return 0.0;
        }

        double steepest = Math.Max(Math.Abs(Math.Sin(tLow)), Math.Abs(Math.Sin(tHigh)));
        double panel = Math.Min(width / 4, GScalesPerPanel * s1 / (r * Math.Max(steepest, 1e-300)));
        int panels = (int)Math.Min(MaxPanels, Math.Ceiling(width / panel));
        double h = width / panels;
        double inverseShort = 1.0 / s2;
        double longScale = 1.0 / (s1 * Math.Sqrt(2.0));
        // Every panel has the same node offsets d_k = h x_k / 2: their sines and cosines once, then
        // sin(c + d) and cos(c + d) by the addition formulas from each panel centre's.
        Span<double> sinD = stackalloc double[PanelNodes.Length];
        Span<double> cosD = stackalloc double[PanelNodes.Length];
        if (vector)
        {
            // Four offsets per Vector256.SinCos (the scalar calls were an eighth of the form's time).
            var halfStep = Vector256.Create(0.5 * h);
            for (int k = 0; k < PanelNodes.Length; k += Vector256<double>.Count)
            {
                var (sin, cos) = Vector256.SinCos(halfStep * Vector256.Create(PanelNodes[k], PanelNodes[k + 1], PanelNodes[k + 2], PanelNodes[k + 3]));
                sin.CopyTo(sinD[k..]);
                cos.CopyTo(cosD[k..]);
            }
        }
        else
        {
            for (int k = 0; k < PanelNodes.Length; k++)
            {
                (sinD[k], cosD[k]) = Math.SinCos(0.5 * h * PanelNodes[k]);
            }
        }

        double sum = vector
            ? OffsetPanelsVector(r, m1, m2, tLow, h, panels, inverseShort, longScale, sinD, cosD)
            : OffsetPanelsScalar(r, m1, m2, tLow, h, panels, inverseShort, longScale, sinD, cosD);
        return Math.Clamp(sum * 0.5 * h * inverseShort / Math.Sqrt(2.0 * Math.PI), 0.0, 1.0);
    }

    /// <summary>Whether the offset form's panels can run four nodes per Vector256 (AVX2 gathers for the erf table).</summary>
    internal static readonly bool VectorOffsetForm = TaylorErf.VectorAvailable && Vector256.IsHardwareAccelerated;

    /// <summary>The panels' weighted sum, one node at a time (hardware without AVX2; the tests' reference for the vector form).</summary>
    private static double OffsetPanelsScalar(
        double r, double m1, double m2, double tLow, double h, int panels, double inverseShort, double longScale, ReadOnlySpan<double> sinD, ReadOnlySpan<double> cosD)
    {
        double sum = 0.0;
        for (int p = 0; p < panels; p++)
        {
            var (sinC, cosC) = Math.SinCos(tLow + ((p + 0.5) * h));
            double panelSum = 0.0;
            for (int k = 0; k < PanelNodes.Length; k++)
            {
                double y = r * ((sinC * cosD[k]) + (cosC * sinD[k]));
                double a = Math.Max(0.0, r * ((cosC * cosD[k]) - (sinC * sinD[k])));
                double z = (y - m2) * inverseShort;
                double g = 0.5 * (TaylorErf.Of((a - m1) * longScale) + TaylorErf.Of((a + m1) * longScale));
                panelSum += PanelWeights[k] * Math.Exp(-0.5 * z * z) * g * a;
            }

            sum += panelSum;
        }

        return sum;
    }

    /// <summary>
    /// <see cref="OffsetPanelsScalar"/> four nodes per Vector256: Vector256.Exp and the gathered erf table
    /// (the scalar form was 2.6 - 3 us per call, mostly its 128 erf and 64 exp; W1 with the Sagnac term
    /// missed took 591 s with it). Agrees with the scalar form to rounding (the vector exp is not
    /// correctly rounded; tests).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static double OffsetPanelsVector(
        double r, double m1, double m2, double tLow, double h, int panels, double inverseShort, double longScale, ReadOnlySpan<double> sinD, ReadOnlySpan<double> cosD)
    {
        ref double sd = ref MemoryMarshal.GetReference(sinD);
        ref double cd = ref MemoryMarshal.GetReference(cosD);
        ref double w = ref MemoryMarshal.GetArrayDataReference(PanelWeights);
        var rv = Vector256.Create(r);
        var m1v = Vector256.Create(m1);
        var m2v = Vector256.Create(m2);
        var shortScale = Vector256.Create(inverseShort);
        var ls = Vector256.Create(longScale);
        var minusHalf = Vector256.Create(-0.5);
        var half = Vector256.Create(0.5);
        var acc = Vector256<double>.Zero;
        for (int p = 0; p < panels; p++)
        {
            var (sinC, cosC) = Math.SinCos(tLow + ((p + 0.5) * h));
            var sc = Vector256.Create(sinC);
            var cc = Vector256.Create(cosC);
            for (int k = 0; k < PanelNodes.Length; k += Vector256<double>.Count)
            {
                var cosk = Vector256.LoadUnsafe(ref cd, (nuint)k);
                var sink = Vector256.LoadUnsafe(ref sd, (nuint)k);
                var y = rv * ((sc * cosk) + (cc * sink));
                var a = Vector256.Max(Vector256<double>.Zero, rv * ((cc * cosk) - (sc * sink)));
                var z = (y - m2v) * shortScale;
                var g = half * (TaylorErf.Of((a - m1v) * ls) + TaylorErf.Of((a + m1v) * ls));
                acc += Vector256.LoadUnsafe(ref w, (nuint)k) * Vector256.Exp(minusHalf * z * z) * g * a;
            }
        }

        return Vector256.Sum(acc);
    }

    /// <summary>
    /// The components of an ENU horizontal mean (mean east, mean north) along the eigenvectors of
    /// [[ee, en], [en, nn]], long axis first (the eigenvector of lambda1 at the angle (1/2) atan2(2 en, ee - nn)).
    /// </summary>
    public static (double Along, double Across) MeanInEigenFrame(double ee, double en, double nn, double meanEast, double meanNorth)
    {
        double theta = 0.5 * Math.Atan2(2.0 * en, ee - nn);
        double c = Math.Cos(theta), s = Math.Sin(theta);
        return ((meanEast * c) + (meanNorth * s), (-meanEast * s) + (meanNorth * c));
    }

    /// <summary>
    /// A mean at or below this fraction of the (short-axis) sigma is taken as zero: the distribution is even
    /// in the mean, so such a mean moves the CDF by about its square, 1e-12 (a bias common to every
    /// satellite leaves S b at rounding level, ~1e-10 m, not exactly zero).
    /// </summary>
    private const double NegligibleMean = 1e-6;

    /// <summary>
    /// Panel width in units of G's step scale s1 / (r max|sin t|): four, so an erf step (about four
    /// scales wide) meets some 16 nodes.
    /// </summary>
    private const double GScalesPerPanel = 4.0;

    /// <summary>Half-width, in short-axis sigmas, of the window the offset form integrates over.</summary>
    private const double OffsetWindow = 10.0;

    /// <summary>Panel cap: a window 256 times wider than G's steps is resolved to well below the sketch accuracy still.</summary>
    private const int MaxPanels = 256;

    // 16-point Gauss-Legendre on [-1, 1], copied out of MathNet once (its rule copies the arrays per access).
    private static readonly MathNet.Numerics.Integration.GaussLegendreRule PanelRule = new(-1.0, 1.0, 16);
    private static readonly double[] PanelNodes = PanelRule.Abscissas;
    private static readonly double[] PanelWeights = PanelRule.Weights;
}

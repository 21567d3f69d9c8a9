using System.Globalization;
using System.Text;
using MathNet.Numerics.LinearAlgebra;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Fits non-negative power-law coefficients (h2, h0, h-1, h-2 and optionally the drift D) to Allan deviation points.
/// </summary>
/// <remarks>
/// Method: the Allan variance is linear in the unknowns,
/// sigma^2(tau) = h2·3f_h/(4 pi^2 tau^2) + h0/(2 tau) + h-1·2 ln2 + h-2·(2 pi^2/3) tau [+ D^2·tau^2/2]
/// (IEEE Std 1139 Table B.2), so each point gives one linear row. Each row is divided by the measured sigma^2, so
/// the residual is the relative error of sigma^2 (every decade weighs the same, instead of the largest sigma
/// dominating). The columns are scaled to unit norm (the raw coefficients span ~10 decades), the non-negative least
/// squares problem is solved by the Lawson-Hanson active-set method, and the columns are unscaled. The reported
/// residual is the rms over the points of sigma_fit/sigma_measured - 1 (relative error of sigma, not sigma^2).
/// Flicker PM (h1) is not fitted: its tau^-1 slope is indistinguishable from white PM without the bandwidth.
/// </remarks>
public static class AllanDeviationFit
{
    /// <summary>Default largest accepted rms relative error of sigma_y: 25 %.</summary>
    public const double DefaultMaxRelativeRms = 0.25;

    /// <summary>Key used in <see cref="ClockDefinitionException"/> for fitting problems.</summary>
    public const string Key = "adev";

    private const double Ln2 = 0.69314718055994530942;

    /// <summary>Fits the coefficients. Throws <see cref="ClockDefinitionException"/> (key "adev") when the points cannot be fitted.</summary>
    /// <param name="points">Allan deviation points; tau &gt; 0 s and sigma &gt; 0, at least as many as free terms (4, or 5 with drift).</param>
    /// <param name="highCutoffHz">Measurement bandwidth f_h for the white PM column. Range: &gt; 0 Hz.</param>
    /// <param name="fitDrift">Also fit a drift term D^2 tau^2/2 (D returned &gt;= 0; the sign is not observable from ADEV).</param>
    /// <param name="maxRelativeRms">Largest accepted rms relative error of sigma_y. Range: &gt; 0.</param>
    public static AllanDeviationFitResult Fit(
        IReadOnlyList<AllanDeviationPoint> points,
        double highCutoffHz,
        bool fitDrift = false,
        double maxRelativeRms = DefaultMaxRelativeRms)
    {
        ArgumentNullException.ThrowIfNull(points);
        int terms = fitDrift ? 5 : 4;
        if (points.Count < terms)
        {
            throw new ClockDefinitionException(Key, string.Create(CultureInfo.InvariantCulture,
                $"{Key}: {points.Count} Allan deviation point(s) cannot determine {terms} free terms (h2, h0, h-1, h-2{(fitDrift ? ", drift" : "")}); give at least {terms} points."));
        }

        if (!(highCutoffHz > 0) || double.IsInfinity(highCutoffHz))
        {
            throw new ClockDefinitionException(Key, string.Create(CultureInfo.InvariantCulture,
                $"{Key}: measurement bandwidth f_h = {highCutoffHz} Hz must be finite and > 0."));
        }

        for (int i = 0; i < points.Count; i++)
        {
            var p = points[i];
            if (!(p.TauSeconds > 0) || !double.IsFinite(p.TauSeconds) || !(p.Sigma > 0) || !double.IsFinite(p.Sigma))
            {
                throw new ClockDefinitionException(Key, string.Create(CultureInfo.InvariantCulture,
                    $"{Key}: point {i} (tau = {p.TauSeconds} s, sigma = {p.Sigma}) is not allowed; tau and sigma must be finite and > 0."));
            }
        }

        var a = Matrix<double>.Build.Dense(points.Count, terms);
        var b = Vector<double>.Build.Dense(points.Count, 1.0);
        for (int i = 0; i < points.Count; i++)
        {
            double tau = points[i].TauSeconds;
            double s2 = points[i].Sigma * points[i].Sigma;
            a[i, 0] = 3.0 * highCutoffHz / (4.0 * Math.PI * Math.PI * tau * tau) / s2;
            a[i, 1] = 1.0 / (2.0 * tau) / s2;
            a[i, 2] = 2.0 * Ln2 / s2;
            a[i, 3] = 2.0 * Math.PI * Math.PI / 3.0 * tau / s2;
            if (fitDrift)
            {
                a[i, 4] = 0.5 * tau * tau / s2;
            }
        }

        var norms = new double[terms];
        for (int j = 0; j < terms; j++)
        {
            norms[j] = a.Column(j).L2Norm();
            a.SetColumn(j, a.Column(j) / norms[j]);
        }

        var scaled = NonNegativeLeastSquares.Solve(a, b);
        var h = new double[terms];
        for (int j = 0; j < terms; j++)
        {
            h[j] = scaled[j] / norms[j];
        }

        var c = new PowerLawCoefficients(h[0], 0, h[1], h[2], h[3], fitDrift ? Math.Sqrt(h[4]) : 0);
        var residuals = new double[points.Count];
        double sumSq = 0;
        for (int i = 0; i < points.Count; i++)
        {
            residuals[i] = c.AllanDeviation(points[i].TauSeconds, highCutoffHz) / points[i].Sigma - 1.0;
            sumSq += residuals[i] * residuals[i];
        }

        double rms = Math.Sqrt(sumSq / points.Count);
        if (!(rms <= maxRelativeRms))
        {
            throw new ClockDefinitionException(Key, DescribeFailure(points, residuals, rms, maxRelativeRms));
        }

        return new AllanDeviationFitResult(c, rms, residuals);
    }

    private static string DescribeFailure(IReadOnlyList<AllanDeviationPoint> points, double[] residuals, double rms, double limit)
    {
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture,
            $"{Key}: no non-negative power-law model (white PM, white FM, flicker FM, random-walk FM) fits the Allan deviation points: rms relative error {rms:P1} exceeds {limit:P1}. Points (tau s: sigma given -> fitted error):");
        for (int i = 0; i < points.Count; i++)
        {
            text.Append(CultureInfo.InvariantCulture,
                $" [{i}] {points[i].TauSeconds:G4}: {points[i].Sigma:G4} -> {residuals[i]:+0.0%;-0.0%}{(Math.Abs(residuals[i]) > limit ? " (poor)" : "")};");
        }

        text.Append(" Check for a slope steeper than tau^+1/2 without drift, or steeper than tau^-1 at short tau.");
        return text.ToString();
    }
}

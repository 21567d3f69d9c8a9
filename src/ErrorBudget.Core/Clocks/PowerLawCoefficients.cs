using System.Globalization;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Power-law noise model of a clock: one-sided fractional-frequency PSD
/// S_y(f) = h2 f^2 + h1 f + h0 + h-1 / f + h-2 / f^2 (1/Hz), plus a linear frequency drift.
/// </summary>
/// <param name="H2">White PM coefficient h2 (s^3, since S_y = h2 f^2 is in 1/Hz). Range: finite, &gt;= 0.</param>
/// <param name="H1">Flicker PM coefficient h1 (s^2). Range: finite, &gt;= 0.</param>
/// <param name="H0">White FM coefficient h0 (s). Range: finite, &gt;= 0.</param>
/// <param name="HMinus1">Flicker FM coefficient h-1 (dimensionless). Range: finite, &gt;= 0.</param>
/// <param name="HMinus2">Random-walk FM coefficient h-2 (1/s). Range: finite, &gt;= 0.</param>
/// <param name="DriftPerSecond">
/// Linear fractional-frequency drift D (1/s): y(t) = y0 + D t. In the simulator this is the drift the broadcast
/// model does NOT remove (set 0 when the upload estimates it perfectly). Range: finite, any sign.
/// </param>
public readonly record struct PowerLawCoefficients(
    double H2,
    double H1,
    double H0,
    double HMinus1,
    double HMinus2,
    double DriftPerSecond)
{
    public const string KeyH2 = "h2";
    public const string KeyH1 = "h1";
    public const string KeyH0 = "h0";
    public const string KeyHMinus1 = "h-1";
    public const string KeyHMinus2 = "h-2";
    public const string KeyDrift = "drift_per_s";

    private const double Ln2 = 0.69314718055994530942;

    /// <summary>
    /// Allan variance sigma_y^2(tau) as the sum of the power-law relations of IEEE Std 1139 Table B.2 /
    /// NIST SP 1065 (valid for 2 pi f_h tau &gt;&gt; 1): white PM 3 f_h h2/(4 pi^2 tau^2); flicker PM
    /// [1.038 + 3 ln(2 pi f_h tau)] h1/(4 pi^2 tau^2); white FM h0/(2 tau); flicker FM 2 ln2 h-1;
    /// random-walk FM (2 pi^2/3) h-2 tau; drift D^2 tau^2 / 2.
    /// </summary>
    /// <param name="tauSeconds">Averaging time tau. Range: &gt; 0 s.</param>
    /// <param name="highCutoffHz">
    /// Measurement bandwidth f_h (Hz), used only by the PM terms. For a sampled sequence at step dt use the
    /// Nyquist frequency 1/(2 dt) (that is what <see cref="ClockSimulator"/> produces). Range: &gt; 0 when h2 or h1 &gt; 0.
    /// </param>
    public double AllanVariance(double tauSeconds, double highCutoffHz)
    {
        if (!(tauSeconds > 0) || double.IsInfinity(tauSeconds))
        {
            throw new ArgumentOutOfRangeException(nameof(tauSeconds), tauSeconds, "tau must be finite and > 0 s.");
        }

        bool needsCutoff = H2 > 0 || H1 > 0;
        if (needsCutoff && (!(highCutoffHz > 0) || double.IsInfinity(highCutoffHz)))
        {
            throw new ArgumentOutOfRangeException(nameof(highCutoffHz), highCutoffHz, "f_h must be finite and > 0 Hz when h2 or h1 is non-zero.");
        }

        double tau2 = tauSeconds * tauSeconds;
        double fourPi2Tau2 = 4.0 * Math.PI * Math.PI * tau2;
        double sum = H0 / (2.0 * tauSeconds)
            + 2.0 * Ln2 * HMinus1
            + 2.0 * Math.PI * Math.PI / 3.0 * HMinus2 * tauSeconds
            + 0.5 * DriftPerSecond * DriftPerSecond * tau2;
        if (H2 > 0)
        {
            sum += 3.0 * highCutoffHz * H2 / fourPi2Tau2;
        }

        if (H1 > 0)
        {
            sum += (1.038 + 3.0 * Math.Log(2.0 * Math.PI * highCutoffHz * tauSeconds)) * H1 / fourPi2Tau2;
        }

        return sum;
    }

    /// <summary>Allan deviation sigma_y(tau) = sqrt(<see cref="AllanVariance"/>) (dimensionless).</summary>
    public double AllanDeviation(double tauSeconds, double highCutoffHz) =>
        Math.Sqrt(AllanVariance(tauSeconds, highCutoffHz));

    /// <summary>
    /// Every problem with the coefficients, one message each, starting with the key
    /// (e.g. "h0: -1E-24 is not allowed; must be finite and >= 0."). Empty when valid.
    /// </summary>
    public IReadOnlyList<string> Validate()
    {
        var errors = new List<string>();
        CheckNonNegative(errors, KeyH2, H2);
        CheckNonNegative(errors, KeyH1, H1);
        CheckNonNegative(errors, KeyH0, H0);
        CheckNonNegative(errors, KeyHMinus1, HMinus1);
        CheckNonNegative(errors, KeyHMinus2, HMinus2);
        if (!double.IsFinite(DriftPerSecond))
        {
            errors.Add(string.Create(CultureInfo.InvariantCulture, $"{KeyDrift}: {DriftPerSecond} is not allowed; must be finite."));
        }

        return errors;
    }

    /// <summary>Throws <see cref="ClockDefinitionException"/> (key of the first problem) listing every problem.</summary>
    public void EnsureValid()
    {
        var errors = Validate();
        if (errors.Count > 0)
        {
            string key = errors[0][..errors[0].IndexOf(':', StringComparison.Ordinal)];
            throw new ClockDefinitionException(key, string.Join(" ", errors));
        }
    }

    private static void CheckNonNegative(List<string> errors, string key, double value)
    {
        if (!double.IsFinite(value) || value < 0)
        {
            errors.Add(string.Create(CultureInfo.InvariantCulture, $"{key}: {value} is not allowed; must be finite and >= 0."));
        }
    }
}

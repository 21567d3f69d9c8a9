using MathNet.Numerics.LinearAlgebra;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Flicker FM as a sum of first-order Gauss-Markov (discrete AR(1)) frequency processes whose summed PSD approximates
/// S_y(f) = h-1 / f over the band [1/T_max, 1/(2 dt)] (from the longest correlation time of interest to the Nyquist
/// frequency of the step).
/// </summary>
/// <remarks>
/// Pole k is z_{i+1} = phi_k z_i + b_k n, phi_k = exp(-dt/T_k), with corner frequencies 1/(2 pi T_k) spaced
/// geometrically from 1/T_max to 1/(2 dt), at about <c>polesPerDecade</c> candidates per decade (at most
/// <see cref="MaxPoles"/>; candidates the fit leaves at zero weight are dropped).
/// Its one-sided PSD is the exact AR(1) spectrum 2 dt b_k^2 / (1 - 2 phi_k cos(2 pi f dt) + phi_k^2). The innovation
/// variances b_k^2 are chosen by non-negative least squares so that the summed PSD times f / h-1 is as close to 1 as
/// possible on a logarithmic grid over the band (relative error, every decade weighed equally); this also flattens the
/// band edges, which the textbook weights b_k^2 proportional to the pole spacing leave 2-3 dB low.
/// <see cref="MaxDeviationDb()"/> reports the achieved accuracy: measured below 0.2 dB over [1/T_max, 1/(5 dt)] and
/// 0.55-0.62 dB up to Nyquist, for bands of 1.3 to 6.3 decades. Outside the band the PSD flattens (below 1/T_max) or
/// is cut by the sampling (above Nyquist).
/// </remarks>
public sealed class FlickerFrequencyBank
{
    /// <summary>Largest number of poles, fixed so a clock state is a fixed-size struct.</summary>
    public const int MaxPoles = 16;

    /// <summary>Default pole density (poles per decade of frequency).</summary>
    public const double DefaultPolesPerDecade = 5.0;

    private const int FitPointsPerDecade = 24;

    private readonly double[] _phi;
    private readonly double[] _innovationSigma;
    private readonly double[] _stationarySigma;

    /// <param name="hMinus1">Flicker FM coefficient h-1. Range: &gt; 0.</param>
    /// <param name="stepSeconds">Step dt. Range: &gt; 0 s.</param>
    /// <param name="maxCorrelationSeconds">T_max, the longest time scale to model (e.g. a few upload intervals). Range: &gt;= 4 dt.</param>
    /// <param name="polesPerDecade">Pole density. Range: [1, 10].</param>
    public FlickerFrequencyBank(double hMinus1, double stepSeconds, double maxCorrelationSeconds, double polesPerDecade = DefaultPolesPerDecade)
    {
        if (!(hMinus1 > 0) || !double.IsFinite(hMinus1))
        {
            throw new ClockDefinitionException(PowerLawCoefficients.KeyHMinus1, $"{PowerLawCoefficients.KeyHMinus1}: {hMinus1} must be finite and > 0 for a flicker bank.");
        }

        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(stepSeconds);
        if (!(maxCorrelationSeconds >= 4 * stepSeconds) || !double.IsFinite(maxCorrelationSeconds))
        {
            throw new ArgumentOutOfRangeException(nameof(maxCorrelationSeconds), maxCorrelationSeconds, "T_max must be finite and >= 4 steps.");
        }

        if (!(polesPerDecade >= 1 && polesPerDecade <= 10))
        {
            throw new ArgumentOutOfRangeException(nameof(polesPerDecade), polesPerDecade, "Range: [1, 10] poles per decade.");
        }

        HMinus1 = hMinus1;
        StepSeconds = stepSeconds;
        LowFrequencyHz = 1.0 / maxCorrelationSeconds;
        HighFrequencyHz = 0.5 / stepSeconds;
        double decades = Math.Log10(HighFrequencyHz / LowFrequencyHz);

        int candidates = Math.Clamp((int)Math.Ceiling(decades * polesPerDecade) + 1, 2, MaxPoles);
        var phi = new double[candidates];
        for (int k = 0; k < candidates; k++)
        {
            double cornerHz = LowFrequencyHz * Math.Pow(HighFrequencyHz / LowFrequencyHz, k / (double)(candidates - 1));
            phi[k] = Math.Exp(-2.0 * Math.PI * cornerHz * stepSeconds);
        }

        // Poles the fit leaves at zero weight are dropped, so they cost neither state nor normals.
        double[] variances = FitInnovationVariances(phi, decades);
        var kept = new List<int>(candidates);
        for (int k = 0; k < candidates; k++)
        {
            if (variances[k] > 0)
            {
                kept.Add(k);
            }
        }

        PoleCount = kept.Count;
        _phi = new double[PoleCount];
        _innovationSigma = new double[PoleCount];
        _stationarySigma = new double[PoleCount];
        for (int i = 0; i < PoleCount; i++)
        {
            int k = kept[i];
            _phi[i] = phi[k];
            _innovationSigma[i] = Math.Sqrt(variances[k]);
            _stationarySigma[i] = Math.Sqrt(variances[k] / (1.0 - phi[k] * phi[k]));
        }
    }

    /// <summary>h-1 (dimensionless).</summary>
    public double HMinus1 { get; }

    /// <summary>Step dt (s).</summary>
    public double StepSeconds { get; }

    /// <summary>Lower band edge 1/T_max (Hz).</summary>
    public double LowFrequencyHz { get; }

    /// <summary>Upper band edge, the Nyquist frequency 1/(2 dt) (Hz).</summary>
    public double HighFrequencyHz { get; }

    /// <summary>Number of poles in use, 1..<see cref="MaxPoles"/> (candidates with zero fitted weight are dropped).</summary>
    public int PoleCount { get; }

    /// <summary>AR(1) coefficient phi_k = exp(-dt/T_k) of pole k.</summary>
    public double Phi(int k) => _phi[k];

    /// <summary>Innovation standard deviation b_k of pole k (dimensionless).</summary>
    public double InnovationSigma(int k) => _innovationSigma[k];

    /// <summary>Stationary standard deviation b_k / sqrt(1 - phi_k^2) of pole k (dimensionless).</summary>
    public double StationarySigma(int k) => _stationarySigma[k];

    /// <summary>One-sided PSD (1/Hz) of the summed discrete process at frequency f (0 &lt; f &lt;= 1/(2 dt)).</summary>
    public double Psd(double frequencyHz)
    {
        double c = Math.Cos(2.0 * Math.PI * frequencyHz * StepSeconds);
        double sum = 0;
        for (int k = 0; k < PoleCount; k++)
        {
            double p = _phi[k];
            sum += 2.0 * StepSeconds * _innovationSigma[k] * _innovationSigma[k] / (1.0 - 2.0 * p * c + p * p);
        }

        return sum;
    }

    /// <summary>
    /// Largest |10 log10(PSD(f) f / h-1)| (dB) over the whole band [1/T_max, 1/(2 dt)]. Measured: about 0.55-0.62 dB for
    /// any band, set by the top edge (every sampled PSD has zero slope at Nyquist while 1/f does not; see the tests).
    /// </summary>
    public double MaxDeviationDb() => MaxDeviationDb(LowFrequencyHz, HighFrequencyHz);

    /// <summary>
    /// Largest |10 log10(PSD(f) f / h-1)| (dB) over [fromHz, toHz] on a logarithmic grid of
    /// <paramref name="pointsPerDecade"/> points per decade, both edges included.
    /// Measured: below about 0.12 dB over [1/T_max, 1/(5 dt)].
    /// </summary>
    public double MaxDeviationDb(double fromHz, double toHz, int pointsPerDecade = 400)
    {
        if (!(fromHz > 0 && toHz >= fromHz && toHz <= HighFrequencyHz))
        {
            throw new ArgumentOutOfRangeException(nameof(toHz), toHz, "Need 0 < fromHz <= toHz <= 1/(2 dt).");
        }

        double decades = Math.Log10(toHz / fromHz);
        int n = Math.Max(2, (int)Math.Ceiling(decades * pointsPerDecade) + 1);
        double worst = 0;
        for (int j = 0; j < n; j++)
        {
            double f = fromHz * Math.Pow(toHz / fromHz, j / (double)(n - 1));
            worst = Math.Max(worst, Math.Abs(10.0 * Math.Log10(Psd(f) * f / HMinus1)));
        }

        return worst;
    }

    private double[] FitInnovationVariances(double[] phi, double decades)
    {
        int rows = Math.Max(2 * phi.Length, (int)Math.Ceiling(decades * FitPointsPerDecade) + 1);
        var a = Matrix<double>.Build.Dense(rows, phi.Length);
        var b = Vector<double>.Build.Dense(rows, 1.0);
        for (int j = 0; j < rows; j++)
        {
            double f = LowFrequencyHz * Math.Pow(HighFrequencyHz / LowFrequencyHz, j / (double)(rows - 1));
            double c = Math.Cos(2.0 * Math.PI * f * StepSeconds);
            for (int k = 0; k < phi.Length; k++)
            {
                double p = phi[k];
                a[j, k] = 2.0 * StepSeconds / (1.0 - 2.0 * p * c + p * p) * f / HMinus1;
            }
        }

        var norms = new double[phi.Length];
        for (int k = 0; k < phi.Length; k++)
        {
            norms[k] = a.Column(k).L2Norm();
            a.SetColumn(k, a.Column(k) / norms[k]);
        }

        var scaled = NonNegativeLeastSquares.Solve(a, b);
        var q = new double[phi.Length];
        for (int k = 0; k < phi.Length; k++)
        {
            q[k] = scaled[k] / norms[k];
        }

        return q;
    }
}

using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Exact discretisation over a fixed step dt of the two-state clock model x' = y + w_f, y' = D + w_g
/// (phase x in s, fractional frequency y in s/s, w_f white FM, w_g the random-walk FM driver, D the drift):
/// Phi = [[1, dt], [0, 1]], process noise <see cref="TwoStateProcessNoise"/>, drift adding D dt^2/2 to x and D dt to y.
/// Immutable; one instance can serve every trial and satellite with the same coefficients and step.
/// </summary>
public readonly struct TwoStateClockModel
{
    /// <summary>Builds the model for h0, h-2 and drift of <paramref name="coefficients"/> (the other terms are ignored here).</summary>
    /// <param name="coefficients">Validated coefficients.</param>
    /// <param name="stepSeconds">Step dt. Range: &gt; 0 s.</param>
    public TwoStateClockModel(in PowerLawCoefficients coefficients, double stepSeconds)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(stepSeconds);
        coefficients.EnsureValid();
        StepSeconds = stepSeconds;
        Noise = TwoStateProcessNoise.For(coefficients.H0, coefficients.HMinus2, stepSeconds);
        DriftPerSecond = coefficients.DriftPerSecond;
    }

    /// <summary>Step dt (s).</summary>
    public double StepSeconds { get; }

    /// <summary>Q(dt) and its Cholesky factor.</summary>
    public TwoStateProcessNoise Noise { get; }

    /// <summary>Deterministic drift D (1/s).</summary>
    public double DriftPerSecond { get; }

    /// <summary>
    /// Advances (x, y) by one step: x += y dt + D dt^2/2 + L11 n1; y += D dt + L21 n1 + L22 n2.
    /// </summary>
    /// <param name="x">Phase, s.</param>
    /// <param name="y">Fractional frequency, s/s.</param>
    /// <param name="n1">First independent standard normal.</param>
    /// <param name="n2">Second independent standard normal.</param>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Step(ref double x, ref double y, double n1, double n2)
    {
        double dt = StepSeconds;
        x += y * dt + 0.5 * DriftPerSecond * dt * dt + Noise.L11 * n1;
        y += DriftPerSecond * dt + Noise.L21 * n1 + Noise.L22 * n2;
    }

    /// <summary>
    /// Variance (s^2) of the phase prediction error at age of data <paramref name="ageSeconds"/> after a perfect reset
    /// (phase and frequency error zero at age 0), bandwidth-free form:
    /// <list type="bullet">
    /// <item>white FM + random-walk FM: exactly Q11(age) = (h0/2) age + (2 pi^2/3) h-2 age^3 (Brown &amp; Hwang);</item>
    /// <item>flicker FM: 2 ln2 h-1 age^2 = age^2 sigma_y^2(age) of a flicker floor. The WFM and RWFM terms obey the same
    /// rule Q11 = age^2 sigma_y^2(age) exactly, so this is the natural bandwidth-free extension. It suits an upload whose
    /// frequency estimate averages the flicker over a span comparable to the age; it is 1.3-6 times smaller (measured,
    /// ages of 4 to 1000 steps) than the instantaneous-frequency reset that <see cref="ClockSimulator.Reset"/> performs (use the overload with the bandwidth
    /// for that).</item>
    /// </list>
    /// Not included: white and flicker PM (they need the bandwidth) and the drift (deterministic: mean error
    /// D age^2 / 2, no variance).
    /// </summary>
    /// <param name="ageSeconds">Age of data. Range: &gt;= 0 s.</param>
    /// <param name="coefficients">Validated coefficients.</param>
    public static double PredictionErrorVariance(double ageSeconds, in PowerLawCoefficients coefficients)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(ageSeconds);
        double q11 = TwoStateProcessNoise.For(coefficients.H0, coefficients.HMinus2, ageSeconds).Q11;
        return q11 + 2.0 * Math.Log(2.0) * coefficients.HMinus1 * ageSeconds * ageSeconds;
    }

    /// <summary>
    /// Variance (s^2) of the phase error at age of data <paramref name="ageSeconds"/> after a reset that zeroes the phase
    /// and the instantaneous frequency, for noise band-limited at f_h (the model <see cref="ClockSimulator"/> follows with
    /// f_h = 1/(2 dt)):
    /// Q11(age) + h-1 age^2 [ln(2 pi f_h age) + gamma_E - 1/2] + h2 f_h / (4 pi^2).
    /// Flicker term derived: Var = integral of (h-1/f) |H(f)|^2 df with H(f) = (e^{i u} - 1)/(i 2 pi f) - age, u = 2 pi f age,
    /// i.e. h-1 age^2 integral_0^{2 pi f_h age} [1 - 2 sin(u)/u + 2 (1 - cos u)/u^2] du/u, whose constant term evaluates to
    /// gamma_E - 1/2 = 0.0772 (numerically); valid for 2 pi f_h age &gt;&gt; 1 (clamped at 0 below). White PM term: the phase
    /// variance h2 f_h/(4 pi^2) of white PM up to f_h, present at every age.
    /// </summary>
    /// <param name="ageSeconds">Age of data. Range: &gt;= 0 s.</param>
    /// <param name="coefficients">Validated coefficients (h1 ignored).</param>
    /// <param name="highCutoffHz">Noise bandwidth f_h. Range: &gt; 0 Hz.</param>
    public static double PredictionErrorVariance(double ageSeconds, in PowerLawCoefficients coefficients, double highCutoffHz)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(ageSeconds);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(highCutoffHz);
        const double gammaMinusHalf = 0.57721566490153286 - 0.5;
        double q11 = TwoStateProcessNoise.For(coefficients.H0, coefficients.HMinus2, ageSeconds).Q11;
        double flicker = ageSeconds > 0
            ? coefficients.HMinus1 * ageSeconds * ageSeconds * Math.Max(0.0, Math.Log(2.0 * Math.PI * highCutoffHz * ageSeconds) + gammaMinusHalf)
            : 0.0;
        return q11 + flicker + coefficients.H2 * highCutoffHz / (4.0 * Math.PI * Math.PI);
    }
}

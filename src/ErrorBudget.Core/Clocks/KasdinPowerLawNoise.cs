using System.Numerics;
using MathNet.Numerics.IntegralTransforms;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Reference generator of 1/f^alpha noise: white Gaussian innovations filtered by the fractional-difference impulse
/// response of Kasdin (Proc. IEEE 83(5), 1995): h_0 = 1, h_k = h_{k-1} (alpha/2 + k - 1) / k, i.e. the filter
/// (1 - z^-1)^(-alpha/2). The linear convolution is done with zero-padded FFTs (MathNet Fourier). Allocates: a
/// reference for tests and offline studies, not for the hot loop (use <see cref="ClockSimulator"/> there).
/// </summary>
public static class KasdinPowerLawNoise
{
    /// <summary>Fills <paramref name="h"/> with the first h.Length filter coefficients for exponent alpha.</summary>
    /// <param name="alpha">PSD exponent of the output, S(f) ~ f^-alpha. Range: [-2, 4] in practice.</param>
    /// <param name="h">Destination, length &gt;= 1.</param>
    public static void Coefficients(double alpha, Span<double> h)
    {
        if (h.Length == 0)
        {
            return;
        }

        h[0] = 1.0;
        for (int k = 1; k < h.Length; k++)
        {
            h[k] = h[k - 1] * (0.5 * alpha + k - 1) / k;
        }
    }

    /// <summary>
    /// Innovation standard deviation that makes the output's one-sided PSD approach h f^-alpha well below Nyquist:
    /// the filter gain is |1 - e^{-i 2 pi f dt}|^-alpha = (2 sin(pi f dt))^-alpha ~ (2 pi f dt)^-alpha and white noise of
    /// variance s^2 has one-sided PSD 2 s^2 dt, so s^2 = h (2 pi)^alpha dt^(alpha-1) / 2 (derived; alpha = 0 gives
    /// h0 = 2 s^2 dt, alpha = 2 gives 2 pi^2 h-2 dt = Q22 of the two-state model).
    /// </summary>
    /// <param name="alpha">Output exponent (alpha = 1 for flicker FM on y, 2 for random-walk FM on y).</param>
    /// <param name="coefficient">The h coefficient of f^-alpha (e.g. h-1 for alpha = 1).</param>
    /// <param name="stepSeconds">Sample interval dt. Range: &gt; 0 s.</param>
    public static double InnovationSigma(double alpha, double coefficient, double stepSeconds) =>
        Math.Sqrt(coefficient * Math.Pow(2.0 * Math.PI, alpha) * Math.Pow(stepSeconds, alpha - 1.0) / 2.0);

    /// <summary>
    /// output[i] = innovationSigma * sum_{k=0}^{i} h_k n_{i-k} for i &lt; N, with N = normals.Length = output.Length
    /// (the process starts from rest at i = 0).
    /// </summary>
    public static void Generate(double alpha, double innovationSigma, ReadOnlySpan<double> normals, Span<double> output)
    {
        int n = normals.Length;
        if (output.Length != n)
        {
            throw new ArgumentException("output must have the length of normals.", nameof(output));
        }

        if (n == 0)
        {
            return;
        }

        // Zero-pad to a power of two >= 2N so the circular convolution equals the linear one on [0, N).
        int size = 1;
        while (size < 2 * n)
        {
            size <<= 1;
        }

        var h = new double[n];
        Coefficients(alpha, h);
        var hf = new Complex[size];
        var wf = new Complex[size];
        for (int i = 0; i < n; i++)
        {
            hf[i] = h[i];
            wf[i] = normals[i];
        }

        // Matlab convention: forward unscaled, inverse scaled by 1/size, so ifft(fft(a) .* fft(b)) = a (*) b.
        Fourier.Forward(hf, FourierOptions.Matlab);
        Fourier.Forward(wf, FourierOptions.Matlab);
        for (int i = 0; i < size; i++)
        {
            wf[i] *= hf[i];
        }

        Fourier.Inverse(wf, FourierOptions.Matlab);
        for (int i = 0; i < n; i++)
        {
            output[i] = innovationSigma * wf[i].Real;
        }
    }
}

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Process-noise covariance Q(dt) of the two-state clock model [phase x (s), frequency y (s/s)] driven by white FM
/// (h0) and random-walk FM (h-2), with its lower Cholesky factor L (Q = L L^T):
/// Q11 = (h0/2) dt + (2 pi^2/3) h-2 dt^3 (s^2), Q12 = pi^2 h-2 dt^2 (s), Q22 = 2 pi^2 h-2 dt (dimensionless).
/// Source: Brown &amp; Hwang, Introduction to Random Signals and Applied Kalman Filtering, 3rd ed., ch. 11;
/// van Dierendonck, McGraw &amp; Brown (1984), 16th PTTI (spectral amplitudes S_f = h0/2, S_g = 2 pi^2 h-2).
/// </summary>
public readonly record struct TwoStateProcessNoise(double Q11, double Q12, double Q22, double L11, double L21, double L22)
{
    /// <summary>Q(dt) and its Cholesky factor. h0 &gt;= 0 s, h-2 &gt;= 0 1/s, dt &gt;= 0 s.</summary>
    public static TwoStateProcessNoise For(double h0, double hMinus2, double stepSeconds)
    {
        double dt = stepSeconds;
        double pi2 = Math.PI * Math.PI;
        double q11 = 0.5 * h0 * dt + 2.0 * pi2 / 3.0 * hMinus2 * dt * dt * dt;
        double q12 = pi2 * hMinus2 * dt * dt;
        double q22 = 2.0 * pi2 * hMinus2 * dt;
        double l11 = Math.Sqrt(q11);
        double l21 = l11 > 0 ? q12 / l11 : 0;

        // Q is positive semi-definite (det = h0 pi^2 h-2 dt^2 + pi^4 h-2^2 dt^4 / 3 >= 0); clamp rounding below zero.
        double l22 = Math.Sqrt(Math.Max(0.0, q22 - l21 * l21));
        return new TwoStateProcessNoise(q11, q12, q22, l11, l21, l22);
    }
}

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Overlapping Allan deviation estimator (NIST SP 1065, Riley 2008, eq. 14 from phase and eq. 15 from
/// fractional frequency). Allocation-free; O(N) for one averaging factor m.
/// </summary>
public static class OverlappingAllanDeviation
{
    /// <summary>
    /// From phase: sigma^2(m tau0) = sum_{i=0}^{N-2m-1} (x_{i+2m} - 2 x_{i+m} + x_i)^2 / (2 (N-2m) (m tau0)^2).
    /// </summary>
    /// <param name="x">Phase (time error) samples, s, at interval tau0. Needs N &gt;= 2m + 1.</param>
    /// <param name="m">Averaging factor. Range: &gt;= 1.</param>
    /// <param name="tau0Seconds">Sample interval. Range: &gt; 0 s.</param>
    public static double FromPhase(ReadOnlySpan<double> x, int m, double tau0Seconds)
    {
        Check(x.Length - 1, m);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(tau0Seconds);
        int terms = x.Length - 2 * m;
        double sum = 0;
        for (int i = 0; i < terms; i++)
        {
            double d = x[i + 2 * m] - 2.0 * x[i + m] + x[i];
            sum += d * d;
        }

        double tau = m * tau0Seconds;
        return Math.Sqrt(sum / (2.0 * terms * tau * tau));
    }

    /// <summary>
    /// From fractional frequency: sigma^2(m tau0) = sum_{j=0}^{M-2m} [sum_{i=j}^{j+m-1} (y_{i+m} - y_i)]^2 / (2 m^2 (M-2m+1)).
    /// </summary>
    /// <param name="y">Fractional frequency samples (averages over tau0). Needs M &gt;= 2m.</param>
    /// <param name="m">Averaging factor. Range: &gt;= 1.</param>
    public static double FromFrequency(ReadOnlySpan<double> y, int m)
    {
        Check(y.Length, m);
        int terms = y.Length - 2 * m + 1;

        // Sliding window: inner = sum_{i=j}^{j+m-1} (y_{i+m} - y_i), updated by one sample at each end.
        double inner = 0;
        for (int i = 0; i < m; i++)
        {
            inner += y[i + m] - y[i];
        }

        double sum = inner * inner;
        for (int j = 1; j < terms; j++)
        {
            inner += y[j + 2 * m - 1] - 2.0 * y[j + m - 1] + y[j - 1];
            sum += inner * inner;
        }

        return Math.Sqrt(sum / (2.0 * (double)m * m * terms));
    }

    internal static void Check(int frequencySamples, int m)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(m);
        if (frequencySamples < 2 * m)
        {
            throw new ArgumentException($"Averaging factor m = {m} needs at least {2 * m} frequency samples ({2 * m + 1} phase samples); got {frequencySamples}.", nameof(m));
        }
    }
}

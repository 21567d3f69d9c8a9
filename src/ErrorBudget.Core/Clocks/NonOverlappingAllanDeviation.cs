namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Non-overlapping (original two-sample) Allan deviation (NIST SP 1065, Riley 2008, eq. 6 from frequency, eq. 7 from
/// phase): adjacent, non-overlapping averages over m tau0. Allocation-free.
/// </summary>
public static class NonOverlappingAllanDeviation
{
    /// <summary>sigma^2 = sum_k (ybar_{k+1} - ybar_k)^2 / (2 (K - 1)), ybar_k the mean of block k of m samples, K = floor(M/m) blocks.</summary>
    /// <param name="y">Fractional frequency samples. Needs M &gt;= 2m.</param>
    /// <param name="m">Averaging factor. Range: &gt;= 1.</param>
    public static double FromFrequency(ReadOnlySpan<double> y, int m)
    {
        OverlappingAllanDeviation.Check(y.Length, m);
        int blocks = y.Length / m;
        double sum = 0;
        double previous = BlockMean(y, 0, m);
        for (int k = 1; k < blocks; k++)
        {
            double current = BlockMean(y, k * m, m);
            double d = current - previous;
            sum += d * d;
            previous = current;
        }

        return Math.Sqrt(sum / (2.0 * (blocks - 1)));
    }

    /// <summary>sigma^2 = sum_{i=0,m,2m..} (x_{i+2m} - 2x_{i+m} + x_i)^2 / (2 K tau^2), K terms with i + 2m &lt;= N - 1.</summary>
    /// <param name="x">Phase samples, s. Needs N &gt;= 2m + 1.</param>
    /// <param name="m">Averaging factor. Range: &gt;= 1.</param>
    /// <param name="tau0Seconds">Sample interval. Range: &gt; 0 s.</param>
    public static double FromPhase(ReadOnlySpan<double> x, int m, double tau0Seconds)
    {
        OverlappingAllanDeviation.Check(x.Length - 1, m);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(tau0Seconds);
        double sum = 0;
        int terms = 0;
        for (int i = 0; i + 2 * m < x.Length; i += m)
        {
            double d = x[i + 2 * m] - 2.0 * x[i + m] + x[i];
            sum += d * d;
            terms++;
        }

        double tau = m * tau0Seconds;
        return Math.Sqrt(sum / (2.0 * terms * tau * tau));
    }

    private static double BlockMean(ReadOnlySpan<double> y, int start, int m)
    {
        double s = 0;
        for (int i = start; i < start + m; i++)
        {
            s += y[i];
        }

        return s / m;
    }
}

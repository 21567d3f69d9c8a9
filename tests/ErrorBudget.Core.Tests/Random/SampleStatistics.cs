namespace ErrorBudget.Core.Tests.Random;

/// <summary>Small sample statistics for the generator tests.</summary>
internal static class SampleStatistics
{
    public static double Mean(ReadOnlySpan<double> x)
    {
        double sum = 0;
        foreach (double v in x)
        {
            sum += v;
        }

        return sum / x.Length;
    }

    /// <summary>The unbiased sample variance (divisor n - 1).</summary>
    public static double Variance(ReadOnlySpan<double> x)
    {
        double mean = Mean(x);
        double sum = 0;
        foreach (double v in x)
        {
            sum += (v - mean) * (v - mean);
        }

        return sum / (x.Length - 1);
    }

    /// <summary>The Pearson correlation of two equally long samples.</summary>
    public static double Correlation(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        double mx = Mean(x);
        double my = Mean(y);
        double sxy = 0, sxx = 0, syy = 0;
        for (int i = 0; i < x.Length; i++)
        {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
            syy += (y[i] - my) * (y[i] - my);
        }

        return sxy / Math.Sqrt(sxx * syy);
    }
}

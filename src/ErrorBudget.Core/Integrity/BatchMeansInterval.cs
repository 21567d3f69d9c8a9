using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Integrity;

/// <summary>
/// Batch-means confidence interval: B independent batch estimates of the same quantity (for instance one
/// per block of Monte Carlo trials) are treated as B draws of an approximately normal variable, so their
/// mean has a Student-t interval with B − 1 degrees of freedom (common practice in simulation output
/// analysis; the t interval itself is the textbook one).
/// </summary>
internal static class BatchMeansInterval
{
    /// <summary>The smallest number of batches that has a sample variance.</summary>
    public const int MinBatches = 2;

    /// <summary>
    /// Mean, standard error and two-sided t interval of the batch estimates. Allocates nothing beyond the
    /// quantile's root finder.
    /// </summary>
    /// <param name="batchEstimates">xⱼ, one estimate per batch. Range: B ≥ 2 entries, each finite.</param>
    /// <param name="confidence">c, the two-sided coverage. Range: 0 &lt; c &lt; 1.</param>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than two batches, a non-finite estimate, or c outside (0, 1).</exception>
    public static BatchMeansEstimate Compute(ReadOnlySpan<double> batchEstimates, double confidence)
    {
        int b = batchEstimates.Length;
        if (b < MinBatches)
        {
            throw new ArgumentOutOfRangeException(nameof(batchEstimates), b, $"batch means need at least {MinBatches} batches.");
        }

        if (!(confidence > 0.0 && confidence < 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(confidence), confidence, "confidence must be in (0, 1).");
        }

        double sum = 0.0;
        foreach (double x in batchEstimates)
        {
            if (!double.IsFinite(x))
            {
                throw new ArgumentOutOfRangeException(nameof(batchEstimates), x, "every batch estimate must be finite.");
            }

            sum += x;
        }

        double mean = sum / b;
        double squares = 0.0;
        foreach (double x in batchEstimates)
        {
            double d = x - mean; // two passes: no cancellation when the spread is small against the mean
            squares += d * d;
        }

        double standardError = Math.Sqrt(squares / (b - 1) / b);
        double t = StudentT.InvCDF(0.0, 1.0, b - 1, 0.5 * (1.0 + confidence));
        double halfWidth = t * standardError;
        return new BatchMeansEstimate(mean, standardError, halfWidth, mean - halfWidth, mean + halfWidth);
    }
}

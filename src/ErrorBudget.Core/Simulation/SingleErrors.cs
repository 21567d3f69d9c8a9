using ErrorBudget.Core.Errors;

namespace ErrorBudget.Core.Simulation;

/// <summary>The conversion behind <see cref="EpochWork.FillSingle"/>, shared with the tests.</summary>
internal static class SingleErrors
{
    /// <summary>
    /// destination = source in float, with each trial's mean clock error (component 3) over all
    /// <paramref name="satellites"/> subtracted; lanes [trials, stride) are zero. Layout of both:
    /// <see cref="SatelliteErrorSampler.IndexOf"/>. <paramref name="mean"/>: scratch of at least
    /// <paramref name="trials"/> values. Allocates nothing.
    /// </summary>
    public static void Convert(ReadOnlySpan<double> source, Span<float> destination, int satellites, int stride, int trials, Span<double> mean)
    {
        const int clock = 3;
        mean = mean[..trials];
        mean.Clear();
        for (int sat = 0; sat < satellites; sat++)
        {
            ReadOnlySpan<double> row = source.Slice(SatelliteErrorSampler.IndexOf(sat, clock, 0, stride), trials);
            for (int j = 0; j < trials; j++)
            {
                mean[j] += row[j];
            }
        }

        double inverse = 1.0 / satellites;
        for (int j = 0; j < trials; j++)
        {
            mean[j] *= inverse;
        }

        for (int sat = 0; sat < satellites; sat++)
        {
            for (int q = 0; q < SatelliteErrorSampler.Components; q++)
            {
                int start = SatelliteErrorSampler.IndexOf(sat, q, 0, stride);
                ReadOnlySpan<double> row = source.Slice(start, trials);
                Span<float> target = destination.Slice(start, stride);
                for (int j = 0; j < trials; j++)
                {
                    target[j] = (float)(q == clock ? row[j] - mean[j] : row[j]);
                }

                target[trials..].Clear();
            }
        }
    }
}

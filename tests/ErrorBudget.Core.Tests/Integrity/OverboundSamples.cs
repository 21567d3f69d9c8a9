using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>Seeded sample histograms for the overbounding tests.</summary>
internal static class OverboundSamples
{
    private const ulong Seed = 20_240_601;

    /// <summary>n draws of bias + sigma N(0, 1) from stream <paramref name="stream"/>.</summary>
    public static OverboundHistogram Gaussian(long stream, int n, double sigma = 1.0, double bias = 0.0)
    {
        var x = new double[n];
        CounterRng.FillNormals(CounterRng.Key(Seed, RandomPurpose.Spare, stream, 1, 0), 0, x);
        for (int i = 0; i < n; i++)
        {
            x[i] = bias + sigma * x[i];
        }

        var h = new OverboundHistogram();
        h.AddMany(x);
        return h;
    }

    /// <summary>
    /// n draws of the Laplace distribution with scale b (variance 2 b^2) by inversion of its CDF
    /// F(x) = exp(x / b) / 2 for x &lt; 0, 1 - exp(-x / b) / 2 for x &gt;= 0: x = -b sign(u - 1/2) ln(1 - 2 |u - 1/2|).
    /// </summary>
    public static OverboundHistogram Laplace(long stream, int n, double scale)
    {
        ulong key = CounterRng.Key(Seed, RandomPurpose.Spare, stream, 2, 0);
        var h = new OverboundHistogram();
        for (ulong j = 0; j < (ulong)n; j++)
        {
            double u = CounterRng.Uniform(key, j) - 0.5;
            h.Add(-scale * Math.Sign(u) * Math.Log(1.0 - 2.0 * Math.Abs(u)));
        }

        return h;
    }
}

using ErrorBudget.Core.Statistics;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Statistics;

public class DDSketchAccuracyTests
{
    private const int N = 100_000;
    private static readonly double[] Levels = [0.0, 0.01, 0.1, 0.5, 0.9, 0.95, 0.99, 0.999, 1.0];

    public static TheoryData<string, double> Cases()
    {
        var data = new TheoryData<string, double>();
        foreach (string kind in new[] { "lognormal", "uniform", "exponential", "wide-lognormal" })
        {
            data.Add(kind, 0.005);
            data.Add(kind, 0.01);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Every_quantile_is_within_relative_accuracy_of_the_exact_sample_quantile(string kind, double alpha)
    {
        // Guarantee of Masson, Rim & Lee 2019 (Proposition: |estimate - x_q| <= alpha x_q), with the same
        // rank convention on both sides. Float rounding at a bucket edge may add ~1e-15 relative.
        double[] values = Sample(kind);
        var sketch = new DDSketch(alpha);
        foreach (double v in values)
        {
            sketch.Add(v);
        }

        Array.Sort(values);
        Assert.Equal(N, sketch.Count);
        foreach (double q in Levels)
        {
            double exact = ExactQuantile.Of(values, q);
            double estimate = sketch.Quantile(q);
            Assert.True(Math.Abs(estimate - exact) <= alpha * exact * (1 + 1e-9),
                $"{kind}, alpha {alpha}, q {q}: estimate {estimate:R}, exact {exact:R}");
        }
    }

    private static double[] Sample(string kind)
    {
        var random = new System.Random(kind.Length * 7919 + 1); // fixed seed per data set
        var values = new double[N];
        IContinuousDistribution distribution = kind switch
        {
            "lognormal" => new LogNormal(0.0, 1.0, random),
            "uniform" => new ContinuousUniform(0.0, 10.0, random),
            "exponential" => new Exponential(2.0, random),
            _ => new LogNormal(-3.0, 3.0, random), // spans ~1e-7 .. 1e5: many buckets, both store directions
        };
        distribution.Samples(values);
        return values;
    }
}

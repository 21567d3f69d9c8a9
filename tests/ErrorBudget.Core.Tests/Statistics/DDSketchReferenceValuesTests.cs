using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Statistics;

public class DDSketchReferenceValuesTests
{
    private const double EstimateToleranceAbs = 1e-4; // REFERENCE-VALUES.md section 10 quotes 4 decimals

    [Fact]
    public void Gamma_at_one_percent_accuracy_is_1_0202()
    {
        // gamma = (1 + alpha) / (1 - alpha) = 1.01 / 0.99 (Masson, Rim & Lee 2019; REFERENCE-VALUES.md section 10).
        var sketch = new DDSketch(0.01);
        Assert.Equal(1.0202020202020202, sketch.Gamma, 1e-15);
        Assert.Equal(0.01, sketch.RelativeAccuracy);
    }

    [Theory]
    // Keys ceil(log_gamma x) and estimates 2 gamma^k / (gamma + 1), alpha = 0.01: values derived in
    // REFERENCE-VALUES.md section 10 (check 29) from the paper's formulas.
    [InlineData(1.0, 0, 0.99)]
    [InlineData(100.0, 231, 100.4946)]
    [InlineData(12.34, 126, 12.3053)]
    public void Keys_and_estimates_match_the_worked_values(double value, int expectedKey, double expectedEstimate)
    {
        var sketch = new DDSketch(0.01);
        Assert.Equal(expectedKey, sketch.KeyOf(value));
        sketch.Add(value);
        Assert.Equal(expectedEstimate, sketch.Quantile(0.5), EstimateToleranceAbs);
        Assert.True(Math.Abs(sketch.Quantile(0.5) - value) <= 0.01 * value, "estimate within alpha of the value");
    }

    [Fact]
    public void Bucket_edges_are_gamma_powers()
    {
        // Bucket k covers (gamma^(k-1), gamma^k] (paper, section 2): just above gamma^k moves to k + 1.
        var sketch = new DDSketch(0.01);
        double edge = Math.Pow(sketch.Gamma, 50);
        Assert.Equal(51, sketch.KeyOf(edge * (1 + 1e-12)));
        Assert.Equal(50, sketch.KeyOf(edge * (1 - 1e-12)));
        Assert.Equal(-50, sketch.KeyOf(1.0 / edge * (1 - 1e-12)));
    }
}

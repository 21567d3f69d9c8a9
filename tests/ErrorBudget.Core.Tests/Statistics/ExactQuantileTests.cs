using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Statistics;

public class ExactQuantileTests
{
    [Theory]
    // x_(max(1, ceil(q n))) of 10, 20, 30, 40 (1-based order statistics; derived from the definition).
    [InlineData(0.0, 10.0)]
    [InlineData(0.25, 10.0)]
    [InlineData(0.2500001, 20.0)]
    [InlineData(0.5, 20.0)]
    [InlineData(0.75, 30.0)]
    [InlineData(0.76, 40.0)]
    [InlineData(1.0, 40.0)]
    public void Returns_the_order_statistic_of_rank_ceil_q_n(double q, double expected)
    {
        double[] sorted = [10, 20, 30, 40];
        Assert.Equal(expected, ExactQuantile.Of(sorted, q));
    }

    [Fact]
    public void Empty_set_gives_nan_and_bad_levels_throw()
    {
        Assert.True(double.IsNaN(ExactQuantile.Of([], 0.5)));
        Assert.Throws<ArgumentOutOfRangeException>(() => ExactQuantile.Of([1.0], 1.01));
    }
}

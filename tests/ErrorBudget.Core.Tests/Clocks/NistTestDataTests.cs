using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Tests.Clocks;

public class NistTestDataTests
{
    // NIST SP 1065 (Riley 2008) 1000-point test set; values as in REFERENCE-VALUES.md section 2.4 / suggested check 9.
    private const double Tolerance = 1e-9; // absolute, as the reference values are given to 10 digits

    private static double[] TestData()
    {
        // n_0 = 1234567890, n_{i+1} = 16807 n_i mod 2147483647, y_i = n_i / 2147483647 (i = 0..999).
        var y = new double[1000];
        long n = 1234567890;
        for (int i = 0; i < y.Length; i++)
        {
            y[i] = n / 2147483647.0;
            n = 16807 * n % 2147483647;
        }

        return y;
    }

    private static double[] Phase(double[] y)
    {
        var x = new double[y.Length + 1];
        for (int i = 0; i < y.Length; i++)
        {
            x[i + 1] = x[i] + y[i];
        }

        return x;
    }

    [Fact]
    public void Generated_data_has_the_published_mean_and_standard_deviation()
    {
        var y = TestData();
        Assert.Equal(0.5748904732, y[0], Tolerance);
        Assert.Equal(0.4897744629, MathNet.Numerics.Statistics.Statistics.Mean(y), Tolerance);
        Assert.Equal(0.2884663647, MathNet.Numerics.Statistics.Statistics.StandardDeviation(y), Tolerance);
    }

    [Theory]
    [InlineData(1, 0.2922318781)]
    [InlineData(10, 0.0915995342)]
    [InlineData(100, 0.0324134303)]
    public void Overlapping_adev_from_frequency_and_phase_match_nist(int m, double expected)
    {
        var y = TestData();
        Assert.Equal(expected, OverlappingAllanDeviation.FromFrequency(y, m), Tolerance);
        Assert.Equal(expected, OverlappingAllanDeviation.FromPhase(Phase(y), m, 1.0), Tolerance);
    }

    [Theory]
    [InlineData(10, 0.0996573606)]
    [InlineData(100, 0.0389780433)]
    public void Non_overlapping_adev_from_frequency_and_phase_match_nist(int m, double expected)
    {
        var y = TestData();
        Assert.Equal(expected, NonOverlappingAllanDeviation.FromFrequency(y, m), Tolerance);
        Assert.Equal(expected, NonOverlappingAllanDeviation.FromPhase(Phase(y), m, 1.0), Tolerance);
    }

    [Fact]
    public void Phase_adev_scales_with_the_sample_interval()
    {
        // Derived from eq. (14): x in seconds at tau0 = 10 s equals y * tau0, so ADEV is unchanged.
        var y = TestData();
        var x = Phase(y);
        for (int i = 0; i < x.Length; i++)
        {
            x[i] *= 10.0;
        }

        Assert.Equal(0.0915995342, OverlappingAllanDeviation.FromPhase(x, 10, 10.0), Tolerance);
    }

    [Fact]
    public void Too_few_samples_for_the_averaging_factor_is_an_error()
    {
        var y = new double[9];
        var ex = Assert.Throws<ArgumentException>(() => OverlappingAllanDeviation.FromFrequency(y, 5));
        Assert.Contains("m = 5", ex.Message, StringComparison.Ordinal);
    }
}

using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Random;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// Batch-means Student-t interval: t quantiles against closed forms and tables, a hand-worked case, and the
/// nominal coverage of Gaussian batches by simulation.
/// </summary>
public class BatchMeansIntervalTests
{
    /// <summary>The t factor the interval used: HalfWidth / StandardError.</summary>
    private static double TFactor(int batches, double confidence)
    {
        var x = Enumerable.Range(0, batches).Select(i => (double)(i * i % 7)).ToArray(); // any non-constant set
        var e = BatchMeansInterval.Compute(x, confidence);
        return e.HalfWidth / e.StandardError;
    }

    [Fact]
    public void Two_and_three_batches_use_the_closed_form_t_quantiles()
    {
        // Derived: ν = 1 is the Cauchy law, t_p = tan(π(p − 1/2)), so t_{0.975,1} = tan(0.475π) = 12.7062;
        // ν = 2 has t_p = (2p − 1)/√(2p(1 − p)), so t_{0.975,2} = 0.95/√0.04875 = 4.3027.
        // Tolerance 1e-5: MathNet solves the quantile to 1e-8 in probability, ≤ 5e-6 in t where the density is 0.002.
        const double Tolerance = 1e-5;
        Assert.Equal(Math.Tan(0.475 * Math.PI), TFactor(2, 0.95), Tolerance);
        Assert.Equal(0.95 / Math.Sqrt(2 * 0.975 * 0.025), TFactor(3, 0.95), Tolerance);
    }

    [Theory]
    [InlineData(10, 0.95, 2.262)]
    [InlineData(5, 0.95, 2.776)]
    [InlineData(5, 0.90, 2.132)]
    [InlineData(10, 0.99, 3.250)]
    public void The_t_factor_matches_standard_tables(int batches, double confidence, double table)
    {
        // Standard two-sided Student t tables (from memory): t_{0.975,9} = 2.262, t_{0.975,4} = 2.776,
        // t_{0.95,4} = 2.132, t_{0.995,9} = 3.250. Tables print 3 decimals: tolerance 5e-4 (half a unit).
        Assert.Equal(table, TFactor(batches, confidence), 5e-4);
    }

    [Fact]
    public void Five_batches_give_the_hand_worked_interval()
    {
        // By hand: x = 1..5, mean 3, s² = 10/4 = 2.5, SE = √(2.5/5) = 0.707107; half-width = t_{0.975,4} · SE
        // with t from MathNet (checked against the table above).
        const double Tolerance = 1e-12;
        var e = BatchMeansInterval.Compute([1.0, 2.0, 3.0, 4.0, 5.0], 0.95);
        double t = StudentT.InvCDF(0.0, 1.0, 4, 0.975);
        Assert.Equal(3.0, e.Mean, Tolerance);
        Assert.Equal(Math.Sqrt(0.5), e.StandardError, Tolerance);
        Assert.Equal(t * Math.Sqrt(0.5), e.HalfWidth, Tolerance);
        Assert.Equal(3.0 - e.HalfWidth, e.Lower, Tolerance);
        Assert.Equal(3.0 + e.HalfWidth, e.Upper, Tolerance);
    }

    [Theory]
    [InlineData(3)]
    [InlineData(10)]
    public void Interval_of_gaussian_batches_covers_the_true_mean_at_the_nominal_rate(int batches)
    {
        // For exactly Gaussian batches the t interval covers μ with probability exactly 0.95 (textbook), so the count
        // of covering repetitions is Binomial(R, 0.95): mean 3800, sd 13.8 for R = 4000; accept ± 4.5 sd (±62).
        // A normal quantile in place of t would cover 0.92 (B = 10) or 0.81 (B = 3) and fail by > 8 sd.
        const int Repetitions = 4000;
        const double Mu = 3.0, Sigma = 2.0, Confidence = 0.95;
        ulong key = CounterRng.Key(20250101, RandomPurpose.Spare, batches, 0, 0);
        var draws = new double[batches];
        int covered = 0;
        for (int r = 0; r < Repetitions; r++)
        {
            CounterRng.FillNormals(key, (ulong)(r * batches), draws);
            for (int j = 0; j < batches; j++)
            {
                draws[j] = Mu + (Sigma * draws[j]);
            }

            var e = BatchMeansInterval.Compute(draws, Confidence);
            covered += e.Lower <= Mu && Mu <= e.Upper ? 1 : 0;
        }

        double expected = Repetitions * Confidence;
        double band = 4.5 * Math.Sqrt(Repetitions * Confidence * (1 - Confidence));
        Assert.InRange(covered, expected - band, expected + band);
    }

    [Fact]
    public void Fewer_than_two_batches_a_non_finite_estimate_or_a_bad_confidence_is_rejected()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => BatchMeansInterval.Compute([1.0], 0.95));
        Assert.Throws<ArgumentOutOfRangeException>(() => BatchMeansInterval.Compute([1.0, double.NaN], 0.95));
        Assert.Throws<ArgumentOutOfRangeException>(() => BatchMeansInterval.Compute([1.0, 2.0], 1.0));
        Assert.Throws<ArgumentOutOfRangeException>(() => BatchMeansInterval.Compute([1.0, 2.0], 0.0));
    }

    [Fact]
    public void Identical_batches_give_a_zero_width_interval_at_their_value()
    {
        // Derived: s = 0 ⇒ SE = 0 ⇒ half-width 0, whatever t is.
        var e = BatchMeansInterval.Compute([0.1, 0.1, 0.1, 0.1], 0.99);
        Assert.Equal(0.0, e.StandardError, 1e-17);
        Assert.Equal(0.1, e.Lower, 1e-16);
        Assert.Equal(0.1, e.Upper, 1e-16);
    }
}

using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Random;
using MathNet.Numerics.Distributions;
using Xunit.Abstractions;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// Misleading-information rate by Monte Carlo: a vertical error drawn as N(0, σ_true²) against the tool's
/// VPL = K_V · d_U. When σ_true = d_U the exceedance probability is 2Q(5.33) = 9.8e-8; when σ_true = 2 d_U it is
/// 2Q(2.665) = 7.7e-3 (both derived from the normal law, MathNet Normal.CDF). The observed count must be
/// consistent with the expectation: the expected rate lies inside the Clopper-Pearson interval of the count.
/// </summary>
public class MisleadingInformationRateTests(ITestOutputHelper output)
{
    /// <summary>Two-sided confidence of the acceptance interval: a correct tool fails with probability ≤ 1e-3.</summary>
    private const double Confidence = 0.999;

    private const int Chunk = 1 << 16;

    [Fact]
    public void Vertical_error_with_the_assumed_sigma_exceeds_the_vpl_at_two_q_of_5_33()
    {
        // n = 2e8 draws (about 1 s at the measured 2.5e8 normals/s on one core): expected 19.6 exceedances.
        // Power: the 99.9 % interval around ~20 events spans ~[8, 39], so a tail off by a factor 2 (or a generator
        // that never reaches 5.33σ: 0 events gives an upper bound of 3.8e-8) fails.
        const long Draws = 200_000_000;
        var (vpl, dU) = HandPickedVpl();
        double expectedRate = 2.0 * Normal.CDF(0.0, 1.0, -5.33);
        Assert.Equal(9.8e-8, expectedRate, 0.01 * 9.8e-8); // the brief's 2Q(5.33) ~ 9.8e-8, to 1 %

        long exceedances = CountExceedances(CounterRng.Key(7_000_001, RandomPurpose.Spare, 1, 0, 0), Draws, dU, vpl);
        var (lower, upper) = BinomialInterval.ClopperPearson(exceedances, Draws, Confidence);
        output.WriteLine($"{exceedances} exceedances in {Draws} draws; 99.9 % interval [{lower:E3}, {upper:E3}]; 2Q(5.33) = {expectedRate:E3}");
        Assert.True(lower <= expectedRate && expectedRate <= upper,
            $"{exceedances} exceedances in {Draws}: interval [{lower:E3}, {upper:E3}] misses 2Q(5.33) = {expectedRate:E3}");
    }

    [Fact]
    public void Vertical_error_twice_the_assumed_sigma_exceeds_the_vpl_at_two_q_of_2_665()
    {
        // n = 4e6 draws: expected 30 800 exceedances, sd 175; the 99.9 % interval is ±1.9 % of the rate, so an
        // error of 1 % in VPL (which moves 2Q(2.665) by ~8 %: the normal hazard φ/Q is 2.97 there) fails.
        const long Draws = 4_000_000;
        var (vpl, dU) = HandPickedVpl();
        double expectedRate = 2.0 * Normal.CDF(0.0, 1.0, -5.33 / 2.0);
        Assert.Equal(7.7e-3, expectedRate, 0.01 * 7.7e-3); // the brief's 2Q(5.33/2) ~ 7.7e-3, to 1 %

        long exceedances = CountExceedances(CounterRng.Key(7_000_002, RandomPurpose.Spare, 2, 0, 0), Draws, 2.0 * dU, vpl);
        var (lower, upper) = BinomialInterval.ClopperPearson(exceedances, Draws, Confidence);
        output.WriteLine($"{exceedances} exceedances in {Draws} draws; 99.9 % interval [{lower:E4}, {upper:E4}]; 2Q(2.665) = {expectedRate:E4}");
        Assert.True(lower <= expectedRate && expectedRate <= upper,
            $"{exceedances} exceedances in {Draws}: interval [{lower:E4}, {upper:E4}] misses 2Q(2.665) = {expectedRate:E4}");
    }

    /// <summary>VPL of the hand-picked sky from the tool (K_V = 5.33), and the assumed d_U.</summary>
    private static (double VplMeters, double SigmaUpMeters) HandPickedVpl()
    {
        double[] d = IntegrityFixtures.Covariance(IntegrityFixtures.HandPickedLinesOfSight(), IntegrityFixtures.HandPickedWeights());
        var pl = WeightedProtectionLevels.Compute(d, WeightedProtectionLevels.KHorizontalPrecision, WeightedProtectionLevels.KVerticalPrecision);
        return (pl.VplMeters, WeightedProtectionLevels.VerticalSigmaMeters(d));
    }

    /// <summary>Number of draws e = σ_true · z, z ~ N(0, 1), with |e| &gt; VPL.</summary>
    private static long CountExceedances(ulong key, long draws, double trueSigmaMeters, double vplMeters)
    {
        var buffer = new double[Chunk];
        long count = 0;
        for (long start = 0; start < draws; start += Chunk)
        {
            Span<double> z = buffer.AsSpan(0, (int)Math.Min(Chunk, draws - start));
            CounterRng.FillNormals(key, (ulong)start, z);
            foreach (double x in z)
            {
                count += Math.Abs(trueSigmaMeters * x) > vplMeters ? 1 : 0;
            }
        }

        return count;
    }
}

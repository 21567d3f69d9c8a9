using ErrorBudget.Core.Clocks;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Clocks;

public class TwoStateSimulationTests
{
    [Fact]
    public void Long_simulation_reproduces_white_plus_random_walk_fm_within_10_percent()
    {
        // REFERENCE-VALUES check 12: ADEV^2 = h0/(2 tau) + (2 pi^2/3) h-2 tau within +-10 %, over tau = 1..1000 steps,
        // across the WFM/RWFM crossover (at tau = sqrt(3 h0 / (4 pi^2 h-2)) ~ 390 s here). With N = 1e6 phase points
        // the 99.9 % chi-square interval (edf of the dominant noise, NIST SP 1065 Table 5) is asserted inside +-10 %.
        const double bound = 0.10;
        var c = new PowerLawCoefficients(0, 0, 2e-24, 0, 1e-30, 0);
        const double dt = 1.0;
        var model = new TwoStateClockModel(c, dt);
        var normals = new SeededNormals(21);
        const int n = 1_000_000;
        var x = new double[n + 1];
        double phase = 0, freq = 0;
        for (int i = 1; i <= n; i++)
        {
            model.Step(ref phase, ref freq, normals.Next(), normals.Next());
            x[i] = phase;
        }

        foreach (int m in new[] { 1, 10, 100, 1000 })
        {
            double tau = m * dt;
            double expected = Math.Sqrt(c.H0 / (2 * tau) + 2 * Math.PI * Math.PI / 3 * c.HMinus2 * tau);
            var noise = c.H0 / (2 * tau) > 2 * Math.PI * Math.PI / 3 * c.HMinus2 * tau ? AllanEdf.Noise.WhiteFm : AllanEdf.Noise.RandomWalkFm;
            var (low, high) = AllanEdf.DeviationRatioInterval(AllanEdf.Overlapping(noise, n + 1, m), 1e-3);
            Assert.True(high - 1 < bound && 1 - low < bound, $"m = {m}: chi-square interval wider than the 10 % check");
            double ratio = OverlappingAllanDeviation.FromPhase(x, m, dt) / expected;
            Assert.InRange(ratio, 1 - bound, 1 + bound);
        }
    }

    [Fact]
    public void Phase_error_variance_after_resets_matches_q11_of_the_age()
    {
        // Brown & Hwang Q11(age) = (h0/2) age + (2 pi^2/3) h-2 age^3 is the phase prediction-error variance after a perfect
        // reset. With R independent resets the sample mean square (mean known 0) is Q11 chi2(R)/R: assert the 99.9 %
        // two-sided interval at each age (R = 4000 -> about +-7 %).
        const int resets = 4000;
        const double dt = 300.0;
        int[] ages = [1, 4, 16, 48];
        var c = ClockCatalogue.Lookup("rubidium").Coefficients with { HMinus1 = 0, HMinus2 = 1e-32 };
        var sim = new ClockSimulator(c, dt, 0);
        var sumSq = new double[ages.Length];
        var normals = new SeededNormals(31);
        var buffer = new double[sim.NormalsPerStep];
        for (int r = 0; r < resets; r++)
        {
            var state = default(ClockState);
            sim.Initialize(ref state, ReadOnlySpan<double>.Empty);
            sim.Reset(ref state, 0, 0);
            int a = 0;
            for (int step = 1; step <= ages[^1]; step++)
            {
                normals.Fill(buffer);
                double xOut = sim.Step(ref state, buffer);
                if (step == ages[a])
                {
                    sumSq[a++] += xOut * xOut;
                }
            }
        }

        double low = ChiSquared.InvCDF(resets, 5e-4) / resets;
        double high = ChiSquared.InvCDF(resets, 1 - 5e-4) / resets;
        for (int a = 0; a < ages.Length; a++)
        {
            double age = ages[a] * dt;
            double expected = TwoStateClockModel.PredictionErrorVariance(age, c);
            Assert.Equal(TwoStateProcessNoise.For(c.H0, c.HMinus2, age).Q11, expected);
            Assert.Equal(expected, sim.PhaseErrorVarianceAfterReset(ages[a]), 1e-12 * expected);
            Assert.InRange(sumSq[a] / resets / expected, low, high);
        }
    }
}

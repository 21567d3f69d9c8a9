using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Tests.Clocks;

namespace ErrorBudget.Core.Tests.Errors;

/// <summary>
/// The clock component the sampler writes, for each pure noise type, with no upload inside the run (interval longer
/// than the run) and no estimation error: its overlapping ADEV matches the analytic relation of the type (NIST SP 1065 /
/// IEEE Std 1139 Table B.2: white FM h0/(2 tau), flicker FM 2 ln2 h-1, random-walk FM (2 pi^2/3) h-2 tau, white PM
/// 3 f_h h2/(4 pi^2 tau^2) with f_h = 1/(2 step)) over at least three octaves of tau.
/// Tolerance: the Allan variance averaged over K independent clocks is sigma^2 chi2(K edf)/(K edf), edf of NIST SP 1065
/// Table 5 for the type (tests' AllanEdf); each point must fall in the two-sided 99.9 % interval, widened for flicker by
/// the bank's stated bias allowance (as in SimulatedNoiseTypeTests); the interval itself is asserted narrower than +-10 %.
/// </summary>
public class GradedClockSamplerAdevTests
{
    private const double P = 1e-3;
    private const double Step = 10.0;
    private const int Epochs = 4096;
    private const int Trials = 60;

    // Two satellites staggered by half of a 24 h interval: satellite 0 is uploaded at t = 0, satellite 1 at 12 h,
    // after the 11.4 h run. So 120 free-running clocks.
    private const int Satellites = 2;
    private const double Interval = 86_400.0;

    private static void AssertSamplerAdev(PowerLawCoefficients c, int[] ms, AllanEdf.Noise noise, double biasAllowance)
    {
        var scenario = GradedClockFixture.Make(c, Satellites, Trials, Step, Epochs, Interval);
        Assert.True(Epochs * Step < Interval / 2, "test setup: an upload would fall inside the run");
        var (phase, _) = GradedClockFixture.Run(scenario);
        int clocks = Satellites * Trials;
        foreach (int m in ms)
        {
            double avar = 0;
            foreach (var clock in phase.SelectMany(s => s))
            {
                double adev = OverlappingAllanDeviation.FromPhase(clock, m, Step);
                avar += adev * adev / clocks;
            }

            double edf = clocks * AllanEdf.Overlapping(noise, Epochs, m);
            var (low, high) = AllanEdf.DeviationRatioInterval(edf, P);
            low *= 1 - biasAllowance;
            high *= 1 + biasAllowance;
            Assert.True(high - 1 <= 0.1 && 1 - low <= 0.1, $"m = {m}: interval [{low:F3}, {high:F3}] wider than +-10 %");
            double ratio = Math.Sqrt(avar) / c.AllanDeviation(m * Step, 0.5 / Step);
            Assert.True(ratio >= low && ratio <= high, $"m = {m}: ADEV ratio {ratio:F4} outside [{low:F4}, {high:F4}]");
        }
    }

    [Fact]
    public void White_fm_written_by_the_sampler_follows_h0_over_2_tau()
    {
        AssertSamplerAdev(new PowerLawCoefficients(0, 0, 2e-24, 0, 0, 0), [1, 4, 16, 64], AllanEdf.Noise.WhiteFm, 0);
    }

    [Fact]
    public void Random_walk_fm_written_by_the_sampler_follows_two_pi_squared_over_3_h_minus2_tau()
    {
        AssertSamplerAdev(new PowerLawCoefficients(0, 0, 0, 0, 1e-33, 0), [1, 4, 16, 64], AllanEdf.Noise.RandomWalkFm, 0);
    }

    [Fact]
    public void White_pm_written_by_the_sampler_follows_3_fh_h2_over_4_pi_squared_tau_squared()
    {
        AssertSamplerAdev(new PowerLawCoefficients(1e-22, 0, 0, 0, 0, 0), [1, 4, 16, 64], AllanEdf.Noise.WhitePm, 0);
    }

    [Fact]
    public void Flicker_fm_written_by_the_sampler_has_the_flat_floor_2_ln2_h_minus1()
    {
        // Bias allowance 5 %, as for the simulator alone (FlickerFrequencyBank: within 0.2 dB of h-1/f below 1/(5 dt),
        // plus the discrete sampling at small m); m from 8 where the sampling bias has faded.
        var c = new PowerLawCoefficients(0, 0, 0, 3e-29, 0, 0);
        var bank = GradedClockModel.CreateSimulator(GradedClockFixture.Make(c, Satellites, Trials, Step, Epochs, Interval)).Flicker!;
        Assert.True(bank.MaxDeviationDb(bank.LowFrequencyHz, 0.2 / Step) < 0.2, "bank outside its stated accuracy");
        AssertSamplerAdev(c, [8, 16, 32, 64, 128], AllanEdf.Noise.FlickerFm, 0.05);
    }
}

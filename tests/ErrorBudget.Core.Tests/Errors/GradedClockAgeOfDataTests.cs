using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Errors;

/// <summary>
/// The clock error the sampler writes versus age of data, against the closed form of the two-state model
/// (Brown &amp; Hwang Q11(age) = (h0/2) age + (2 pi^2/3) h-2 age^3, plus the estimation errors sigma_x^2 + (sigma_y age)^2),
/// and the sign convention of <see cref="SatelliteErrorSampler"/>.
/// </summary>
public class GradedClockAgeOfDataTests
{
    private const double C = PhysicalConstants.SpeedOfLight;

    /// <summary>
    /// Sample mean squares over R trials (mean known 0) are sigma^2 chi2(R)/R; with `checks` checks, each must fall in
    /// the two-sided interval of probability 1 - 1e-3 / checks (Bonferroni), asserted narrower than +-10 %.
    /// </summary>
    private static (double Low, double High) MeanSquareInterval(int r, int checks)
    {
        double p = 1e-3 / checks;
        double low = ChiSquared.InvCDF(r, p / 2) / r, high = ChiSquared.InvCDF(r, 1 - p / 2) / r;
        Assert.True(high - 1 < 0.1 && 1 - low < 0.1, $"interval [{low:F3}, {high:F3}] wider than +-10 %");
        return (low, high);
    }

    [Fact]
    public void White_and_random_walk_fm_error_grows_with_age_of_data_as_q11_plus_the_estimation_error()
    {
        // Jitter puts the uploads between epochs, so the ages are not multiples of the step: the two-state law is exact
        // at any age. Random walk exaggerated so that both terms and the estimation errors matter within 6 h.
        const int trials = 4000, satellites = 6, epochs = 72;
        var c = new PowerLawCoefficients(0, 0, 8e-24, 0, 2e-32, 0);
        const double sigmaX = 1e-9, sigmaY = 1e-13;
        var scenario = GradedClockFixture.Make(c, satellites, trials, 300, epochs, 21_600, sigmaX, sigmaY, jitterSeconds: 600);
        var (phase, sampler) = GradedClockFixture.Run(scenario);

        int[] checkedEpochs = [0, 11, 23, 35, 47, 59, 71];
        var (low, high) = MeanSquareInterval(trials, satellites * checkedEpochs.Length);
        int offGrid = 0;
        foreach (int e in checkedEpochs)
        {
            for (int s = 0; s < satellites; s++)
            {
                double age = sampler.AgeOfDataSeconds(s, e);
                offGrid += age % 300 == 0 ? 0 : 1;
                double expected = TwoStateClockModel.PredictionErrorVariance(age, c) + sigmaX * sigmaX + sigmaY * age * sigmaY * age;
                Assert.Equal(expected, GradedClockModel.PhaseErrorVariance(scenario.Clock, age, 300), 1e-12 * expected);
                double meanSquare = phase[s].Average(trial => trial[e] * trial[e]);
                Assert.True(meanSquare / expected >= low && meanSquare / expected <= high,
                    $"satellite {s}, epoch {e}, age {age:F0} s: ratio {meanSquare / expected:F4} outside [{low:F4}, {high:F4}]");
            }
        }

        Assert.True(offGrid > satellites, "test setup: the jitter should move most uploads off the epoch grid");
    }

    [Fact]
    public void Flicker_fm_error_versus_age_matches_the_exact_discrete_law_and_the_band_limited_closed_form()
    {
        // Rubidium (catalogue): white FM, flicker FM and random walk. Uploads every 6 h staggered by 1 h = 12 steps, so each
        // age is m whole steps and the simulator's exact variance after m steps applies; the band-limited closed form of
        // TwoStateClockModel (f_h = 1/(2 step)) is within 5 % of it from 24 steps on (ClockSimulatorTests).
        const int trials = 4000, satellites = 6, epochs = 72;
        const double step = 300, sigmaX = 5e-10;
        var c = ClockCatalogue.Lookup("rubidium").Coefficients;
        var scenario = GradedClockFixture.Make(c, satellites, trials, step, epochs, 21_600, sigmaX);
        var (phase, sampler) = GradedClockFixture.Run(scenario);
        var sim = GradedClockModel.CreateSimulator(scenario);

        int[] checkedEpochs = [5, 30, 71];
        var (low, high) = MeanSquareInterval(trials, satellites * checkedEpochs.Length);
        foreach (int e in checkedEpochs)
        {
            for (int s = 0; s < satellites; s++)
            {
                double age = sampler.AgeOfDataSeconds(s, e);
                int m = (int)Math.Round(age / step);
                Assert.Equal(m * step, age, 1e-6);
                double exact = sim.PhaseErrorVarianceAfterReset(m) + sigmaX * sigmaX;
                double meanSquare = phase[s].Average(trial => trial[e] * trial[e]);
                Assert.True(meanSquare / exact >= low && meanSquare / exact <= high,
                    $"satellite {s}, epoch {e}, {m} steps: ratio {meanSquare / exact:F4} outside [{low:F4}, {high:F4}]");
                if (m >= 24)
                {
                    double closed = GradedClockModel.PhaseErrorVariance(scenario.Clock, age, step);
                    Assert.InRange(exact / closed, 0.95, 1.05);
                }
            }
        }
    }

    [Fact]
    public void The_age_of_data_table_follows_its_model_column()
    {
        // Same clock as above. Tolerance: the samples of a bin share clock paths within a trial, but each (satellite,
        // trial) pair gives at least one independent upload, so n_eff >= satellites x trials = 12000; the rms of
        // n_eff normal values has relative sd 1/sqrt(2 n_eff) = 0.65 %: allow 5 sd (3.2 %) plus the 5 % model bound.
        const int trials = 2000, satellites = 6, epochs = 72;
        var scenario = GradedClockFixture.Make(ClockCatalogue.Lookup("rubidium").Coefficients, satellites, trials, 300, epochs, 21_600, 5e-10);
        var (_, sampler) = GradedClockFixture.Run(scenario);

        var rows = sampler.AgeOfDataRows();

        Assert.Equal((long)satellites * trials * epochs, rows.Sum(r => r.Samples));
        foreach (var row in rows.Where(r => r.Samples > 0 && r.AgeMeanSeconds >= 24 * 300))
        {
            Assert.InRange(row.ClockRangeRmsMeters / row.ClockRangeModelRmsMeters, 1 - 0.032 - 0.05, 1 + 0.032 + 0.05);
            Assert.True(row.ClockRangeP95Meters > row.ClockRangeRmsMeters, "p95 of |normal| is 1.96 sigma");
        }

        Assert.True(rows.Where(r => r.Samples > 0).Select(r => r.ClockRangeRmsMeters).Last() > 2 * rows[0].ClockRangeRmsMeters,
            "the clock error grows with age of data");
    }

    [Fact]
    public void The_clock_component_is_minus_c_times_the_phase_error()
    {
        // A drift-only clock with no estimation error is deterministic: phase error x = D age^2 / 2 (truth minus broadcast,
        // TwoStateClockModel), so the sampler must write -c D age^2 / 2 (SatelliteErrorSampler sign convention).
        const double drift = 2e-18;
        var scenario = GradedClockFixture.Make(new PowerLawCoefficients(0, 0, 0, 0, 0, drift), 4, 3, 300, 40, 7200, jitterSeconds: 100);
        var (phase, sampler) = GradedClockFixture.Run(scenario);

        for (int s = 0; s < 4; s++)
        {
            for (int e = 0; e < 40; e++)
            {
                double age = sampler.AgeOfDataSeconds(s, e);
                double expected = 0.5 * drift * age * age;
                Assert.True(expected >= 0);
                foreach (var trial in phase[s])
                {
                    // Tolerance: rounding of the phase (1e-15 relative) and of -c x / c in the fixture.
                    Assert.Equal(expected, trial[e], 1e-12 * expected + 1e-30);
                }
            }
        }
    }
}

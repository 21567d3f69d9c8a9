using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Orbits;

namespace ErrorBudget.Core.Tests.Errors;

/// <summary>A graded clock's path depends only on (seed, trial, satellite): not on blocks or on the order of calls (DESIGN.md, Determinism).</summary>
public class GradedClockDeterminismTests
{
    [Fact]
    public void Graded_clock_errors_do_not_depend_on_blocks_or_on_skipping_epochs()
    {
        var scenario = GradedClockFixture.Make(ClockCatalogue.Lookup("rubidium").Coefficients, 6, 10, 600, 12, 7200, 1e-9, 1e-14, 300);
        var constellation = Constellation.FromShells(scenario.Shells);
        var states = new SatelliteState[constellation.Count];
        double angle0 = EarthRotation.EarthRotationAngle(scenario.Run.StartUtc);

        double[] At(SatelliteErrorSampler sampler, int epoch, int first, int count)
        {
            double t = scenario.Run.EpochTimeSeconds(epoch);
            constellation.Propagate(t, angle0, states);
            var errors = new double[constellation.Count * SatelliteErrorSampler.Components * count];
            sampler.Sample(epoch, t, angle0 + Wgs84.EarthRotationRateRadPerSecond * t, states, first, count, count, errors);
            return errors;
        }

        // Reference: one block of all ten trials, epochs in order.
        var whole = new SatelliteErrorSampler(scenario, scenario.Run.Seed);
        double[] reference = [];
        for (int e = 0; e <= 7; e++)
        {
            reference = At(whole, e, 0, 10);
        }

        // A block of trials 6..9 in order, and a fresh sampler asked for epoch 7 straight away (it replays).
        var tail = new SatelliteErrorSampler(scenario, scenario.Run.Seed);
        double[] inOrder = [];
        for (int e = 0; e <= 7; e++)
        {
            inOrder = At(tail, e, 6, 4);
        }

        double[] skipped = At(new SatelliteErrorSampler(scenario, scenario.Run.Seed), 7, 6, 4);
        for (int s = 0; s < 6; s++)
        {
            for (int j = 0; j < 4; j++)
            {
                double expected = reference[SatelliteErrorSampler.IndexOf(s, 3, 6 + j, 10)];
                Assert.Equal(expected, inOrder[SatelliteErrorSampler.IndexOf(s, 3, j, 4)]); // exact
                Assert.Equal(expected, skipped[SatelliteErrorSampler.IndexOf(s, 3, j, 4)]); // exact
            }
        }
    }
}

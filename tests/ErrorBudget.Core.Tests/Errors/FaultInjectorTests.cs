using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Integrity;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Errors;

/// <summary>
/// The fault injector's onset process: with rate lambda and duration D, each window of length D holds
/// an onset with probability p = 1 - exp(-lambda D), uniform in the window. At t = (w + u) D a fault is
/// active when this window's onset came before t (probability p u) or the last window's came after
/// (w - 1 + u) D (probability p (1 - u)); the two are independent, so
/// P(active) = 1 - (1 - p u)(1 - p (1 - u)), and two overlapping faults add.
/// </summary>
public class FaultInjectorTests
{
    private static readonly ShellSpec[] Shells = [new("s", 10, 2, 1, 55, 27_600_000, 0, 0, 0, 0)];

    private static FaultSpec Spec(double step = 0, double ramp = 0, double orbit = 0, double constellation = 0) =>
        new(step, 10, 20, ramp, 0.01, 0.02, orbit, 100, 200, constellation, 3600);

    [Theory]
    [InlineData(0.05, 5_000.0)]
    [InlineData(0.3, 12_345.0)]
    public void The_share_of_faulted_satellite_trials_is_one_minus_exp_of_minus_rate_times_duration(double rate, double t)
    {
        var injector = new FaultInjector(Spec(step: rate), Shells, seed: 9);
        const int Trials = 20_000;
        long active = 0, single = 0;
        for (int trial = 0; trial < Trials; trial++)
        {
            for (int sat = 0; sat < 10; sat++)
            {
                if (injector.Active(trial, sat, t, out double clock, out _))
                {
                    active++;
                    Assert.InRange(Math.Abs(clock), 0.0, 40.0); // at most two steps of at most 20 m
                    single += Math.Abs(clock) is >= 10.0 and <= 20.0 ? 1 : 0;
                }
            }
        }

        double p = -double.ExpM1(-rate);
        double u = (t % 3600) / 3600;
        double expected = 1 - ((1 - (p * u)) * (1 - (p * (1 - u))));
        var (lower, upper) = BinomialInterval.ClopperPearson(active, Trials * 10L, 0.999);
        Assert.InRange(expected, lower, upper);
        // Overlaps are rare (probability p^2 u (1 - u) of an active sample): nearly every active sample is one step in [10, 20] m.
        Assert.True(single >= active * (1 - p), $"{single} single steps of {active}");
    }

    [Fact]
    public void A_ramp_grows_linearly_from_its_onset_and_an_orbit_fault_has_its_magnitude_in_range()
    {
        var injector = new FaultInjector(Spec(ramp: 0.5, orbit: 0.5), Shells, seed: 4);
        int ramps = 0, orbits = 0, inRange = 0;
        for (int trial = 0; trial < 2000; trial++)
        {
            if (injector.Active(trial, 3, 9000, out double clock, out Vec3 orbit))
            {
                // |ramp| <= max rate x duration (twice that for two overlapping ramps).
                Assert.InRange(Math.Abs(clock), 0.0, 2 * 0.02 * 3600);
                ramps += clock != 0 ? 1 : 0;
                if (orbit.Norm > 0)
                {
                    orbits++;
                    Assert.InRange(orbit.Norm, 0.0, 400.0 + 1e-9);
                    inRange += orbit.Norm is >= 100.0 - 1e-9 and <= 200.0 + 1e-9 ? 1 : 0;
                }
            }
        }

        Assert.True(ramps > 100 && orbits > 100, $"{ramps} ramps, {orbits} orbit faults");
        Assert.True(inRange >= 0.85 * orbits, $"{inRange} of {orbits} orbit faults alone in [100, 200] m"); // overlaps: P(two) / P(active) <= (p^2 / 4) / p ~ 10 % of active samples here (p = 0.39)
    }

    [Fact]
    public void A_shell_wide_fault_steps_every_satellite_of_the_shell_at_once()
    {
        var injector = new FaultInjector(Spec(constellation: 0.5), Shells, seed: 2);
        int checkedTrials = 0;
        for (int trial = 0; trial < 500; trial++)
        {
            bool first = injector.Active(trial, 0, 7200, out _, out _);
            for (int sat = 1; sat < 10; sat++)
            {
                Assert.Equal(first, injector.Active(trial, sat, 7200, out _, out _));
            }

            checkedTrials += first ? 1 : 0;
        }

        Assert.True(checkedTrials > 50, $"{checkedTrials} trials with a shell fault");
    }

    [Fact]
    public void Faults_are_the_same_for_the_same_seed_and_differ_for_another()
    {
        var a = new FaultInjector(Spec(step: 0.5), Shells, seed: 1);
        var b = new FaultInjector(Spec(step: 0.5), Shells, seed: 1);
        var c = new FaultInjector(Spec(step: 0.5), Shells, seed: 2);
        int same = 0, differ = 0;
        for (int trial = 0; trial < 300; trial++)
        {
            a.Active(trial, 1, 4000, out double x, out _);
            b.Active(trial, 1, 4000, out double y, out _);
            c.Active(trial, 1, 4000, out double z, out _);
            Assert.Equal(x, y);
            same++;
            differ += x != z ? 1 : 0;
        }

        Assert.True(differ > 50, $"{differ} of {same} trials differ with another seed");
    }
}

using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Errors;

public sealed class SatelliteErrorSamplerTests
{
    private const int Trials = 40_000;

    private static Scenario MakeScenario(double uploadSigma, double growthPerSecond, double interval) => new(
        new RunSettings(5, Trials, new DateTimeOffset(2031, 6, 1, 0, 0, 0, TimeSpan.Zero), 86400, 300),
        [new ShellSpec("s", 6, 3, 1, 55, 27_600_000, 0.0, 0, 0, 0)],
        new GridSpec(30, 30, -90, 90, -180, 180, 0, 10),
        new ClockSpec(uploadSigma, growthPerSecond, interval),
        new OrbitErrorSpec(0.5, 2.0, 1.0),
        new UserEnvironmentSpec(IonosphereMode.DualFrequency, 0, FrequencyPair.L1L5, 0.12, MultipathModel.Airborne, 0.36),
        new AssumedModelSpec(1.0, new UserEnvironmentSpec(IonosphereMode.DualFrequency, 0, FrequencyPair.L1L5, 0.12, MultipathModel.Airborne, 0.36)));

    private static (double[] Errors, SatelliteState[] States, double Angle) SampleEpoch(Scenario scenario, int epoch, int first, int count)
    {
        var constellation = Constellation.FromShells(scenario.Shells);
        var states = new SatelliteState[constellation.Count];
        double t = epoch * scenario.Run.StepSeconds;
        double angle0 = EarthRotation.EarthRotationAngle(scenario.Run.StartUtc);
        constellation.Propagate(t, angle0, states);
        double angle = angle0 + Wgs84.EarthRotationRateRadPerSecond * t;
        var errors = new double[constellation.Count * count * SatelliteErrorSampler.Components];
        new SatelliteErrorSampler(scenario, scenario.Run.Seed).Sample(epoch, t, angle, states, first, count, count, errors);
        return (errors, states, angle);
    }

    /// <summary>Variance tolerance from the chi-square law: sd of a sample variance is sigma^2 sqrt(2 / (n - 1)); allow 5 sd.</summary>
    private static void AssertVariance(double expected, IEnumerable<double> values)
    {
        var v = values.ToArray();
        double mean = v.Average();
        double variance = v.Sum(x => (x - mean) * (x - mean)) / (v.Length - 1);
        double tol = 5 * expected * Math.Sqrt(2.0 / (v.Length - 1));
        Assert.InRange(variance, expected - tol, expected + tol);
    }

    [Fact]
    public void Orbit_errors_have_the_configured_radial_along_and_cross_sigmas()
    {
        var scenario = MakeScenario(1, 0, 43200);
        var (errors, states, angle) = SampleEpoch(scenario, 3, 0, Trials);
        for (int s = 0; s < states.Length; s++)
        {
            var (r, a, c) = OrbitFrame.RadialAlongCross(states[s].PositionInertial, states[s].VelocityInertial);
            Vec3 re = EarthRotation.InertialToEarthFixed(r, angle), ae = EarthRotation.InertialToEarthFixed(a, angle), ce = EarthRotation.InertialToEarthFixed(c, angle);
            Vec3 At(int j)
            {
                return new Vec3(
                    errors[SatelliteErrorSampler.IndexOf(s, 0, j, Trials)],
                    errors[SatelliteErrorSampler.IndexOf(s, 1, j, Trials)],
                    errors[SatelliteErrorSampler.IndexOf(s, 2, j, Trials)]);
            }

            AssertVariance(0.25, Enumerable.Range(0, Trials).Select(j => Vec3.Dot(At(j), re)));
            AssertVariance(4.0, Enumerable.Range(0, Trials).Select(j => Vec3.Dot(At(j), ae)));
            AssertVariance(1.0, Enumerable.Range(0, Trials).Select(j => Vec3.Dot(At(j), ce)));
        }
    }

    [Fact]
    public void Clock_error_variance_grows_with_age_of_data_as_offset_plus_rate()
    {
        // e(age) = offset + rate * age  =>  var = sigma0^2 + (sigma_rate * age)^2 (the simple model of ClockSpec).
        const double sigma0 = 0.5, rate = 1e-4, interval = 21600;
        var scenario = MakeScenario(sigma0, rate, interval);
        var sampler = new SatelliteErrorSampler(scenario, scenario.Run.Seed);
        var (errors, states, _) = SampleEpoch(scenario, 20, 0, Trials);
        for (int s = 0; s < states.Length; s++)
        {
            sampler.AgeOfData(s, 20 * 300.0, out _, out double age);
            Assert.InRange(age, 0, interval);
            double expected = sigma0 * sigma0 + rate * age * rate * age;
            AssertVariance(expected, Enumerable.Range(0, Trials).Select(j => errors[SatelliteErrorSampler.IndexOf(s, 3, j, Trials)]));
        }
    }

    [Fact]
    public void Uploads_are_staggered_evenly_over_one_interval()
    {
        var scenario = MakeScenario(1, 0, 36000);
        var sampler = new SatelliteErrorSampler(scenario, 1);
        var ages = Enumerable.Range(0, 6).Select(s =>
        {
            sampler.AgeOfData(s, 0, out _, out double age);
            return age;
        }).Order().ToArray();
        for (int i = 1; i < ages.Length; i++)
        {
            Assert.Equal(6000, ages[i] - ages[i - 1], 6);
        }
    }

    [Fact]
    public void The_errors_of_a_trial_do_not_depend_on_how_trials_are_split_into_blocks()
    {
        var scenario = MakeScenario(1, 1e-4, 43200);
        var (whole, _, _) = SampleEpoch(scenario, 7, 0, 10);
        var (tail, _, _) = SampleEpoch(scenario, 7, 6, 4);
        for (int s = 0; s < 6; s++)
        {
            for (int j = 0; j < 4; j++)
            {
                for (int k = 0; k < SatelliteErrorSampler.Components; k++)
                {
                    Assert.Equal(whole[SatelliteErrorSampler.IndexOf(s, k, 6 + j, 10)], tail[SatelliteErrorSampler.IndexOf(s, k, j, 4)]);
                }
            }
        }
    }
}

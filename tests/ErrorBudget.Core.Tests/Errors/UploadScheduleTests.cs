using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Errors;

public class UploadScheduleTests
{
    private static Scenario WithJitter(double jitter, UploadJitterDistribution shape, double interval = 7200) =>
        GradedClockFixture.Make(default(PowerLawCoefficients), 8, 1, 300, 10, interval) is var s
            ? s with { Clock = s.Clock with { UploadJitterSeconds = jitter, JitterDistribution = shape } }
            : throw new InvalidOperationException();

    [Theory]
    [InlineData(UploadJitterDistribution.Uniform)]
    [InlineData(UploadJitterDistribution.Gaussian)]
    public void Jitter_has_the_configured_standard_deviation_and_stays_inside_its_bound(UploadJitterDistribution shape)
    {
        // Tolerance: the sample variance of n = 8 x 4000 draws has relative sd sqrt(2/n) for the normal (sqrt(0.8/n) for
        // the uniform, kurtosis 1.8); allow 5 sd of the normal case: 5 sqrt(2 / 32000) = 4 %.
        const double jitter = 500;
        var schedule = new UploadSchedule(WithJitter(jitter, shape), 5);
        var draws = Enumerable.Range(0, 8).SelectMany(s => Enumerable.Range(-2000, 4000).Select(k => schedule.JitterSeconds(s, k))).ToArray();

        double variance = draws.Sum(d => d * d) / draws.Length;
        Assert.InRange(variance / (jitter * jitter), 0.96, 1.04);
        Assert.All(draws, d => Assert.InRange(Math.Abs(d), 0, schedule.JitterBoundSeconds));
        double bound = shape == UploadJitterDistribution.Uniform ? Math.Sqrt(3) * jitter : 4 * jitter;
        Assert.Equal(bound, schedule.JitterBoundSeconds, 1e-9);
    }

    [Fact]
    public void Age_of_data_restarts_at_each_jittered_upload_and_never_exceeds_the_largest_age()
    {
        var schedule = new UploadSchedule(WithJitter(700, UploadJitterDistribution.Gaussian), 9);
        for (int s = 0; s < 8; s++)
        {
            for (long k = -3; k < 30; k++)
            {
                double at = schedule.UploadTimeSeconds(s, k);
                schedule.AgeOfData(s, at + 1e-6, out long upload, out double age);
                Assert.Equal(k, upload);
                Assert.InRange(age, 0, 1e-5);
                schedule.AgeOfData(s, at - 1e-6, out long before, out double old);
                Assert.Equal(k - 1, before);
                Assert.InRange(old, 0, schedule.MaxAgeSeconds);
            }
        }
    }

    [Fact]
    public void Without_jitter_the_schedule_is_the_even_stagger_over_the_constellation()
    {
        var schedule = new UploadSchedule(WithJitter(0, UploadJitterDistribution.Uniform, interval: 8000), 1);
        for (int s = 0; s < 8; s++)
        {
            // Derived: phase_s = interval s / N, so at t = 0 the age is interval (1 - s/N) (interval for s = 0 is age 0).
            schedule.AgeOfData(s, 0, out long k, out double age);
            Assert.Equal(s == 0 ? 0 : -1, k);
            Assert.Equal(s == 0 ? 0 : 8000 - 1000 * s, age, 1e-9);
        }
    }

    [Fact]
    public void A_shell_interval_overrides_the_clock_interval_for_its_satellites()
    {
        var scenario = WithJitter(0, UploadJitterDistribution.Uniform);
        var second = scenario.Shells[0] with { Name = "t", Satellites = 2, Planes = 2 };
        scenario = scenario with { Shells = [scenario.Shells[0], second with { UploadIntervalSeconds = 1800 }] };
        var schedule = new UploadSchedule(scenario, 1);

        Assert.Equal(7200, schedule.IntervalSeconds(0));
        Assert.Equal(1800, schedule.IntervalSeconds(8));
        Assert.Equal(1800, schedule.IntervalSeconds(9));
        Assert.Equal(7200, schedule.MaxIntervalSeconds);
    }
}

using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Errors;

/// <summary>Scenarios with a graded clock, and the sampler run epoch by epoch as the engine runs it.</summary>
internal static class GradedClockFixture
{
    public static Scenario Make(
        PowerLawCoefficients noise, int satellites, int trials, double stepSeconds, int epochs, double intervalSeconds,
        double phaseSigmaSeconds = 0, double frequencySigma = 0, double jitterSeconds = 0)
    {
        var user = new UserEnvironmentSpec(IonosphereMode.DualFrequency, 0, FrequencyPair.L1L5, 0.12, MultipathModel.Airborne, 0.36);
        return new Scenario(
            new RunSettings(17, trials, new DateTimeOffset(2031, 6, 1, 0, 0, 0, TimeSpan.Zero), epochs * stepSeconds, stepSeconds),
            [new ShellSpec("s", satellites, satellites, 0, 55, 27_600_000, 0.0, 0, 0, 0)],
            new GridSpec(30, 30, -90, 90, -180, 180, 0, 10),
            new ClockSpec(0, 0, intervalSeconds)
            {
                Grade = "custom",
                Noise = noise,
                EstimationPhaseSigmaSeconds = phaseSigmaSeconds,
                EstimationFrequencySigma = frequencySigma,
                UploadJitterSeconds = jitterSeconds,
            },
            new OrbitErrorSpec(0.5, 2.0, 1.0),
            user,
            new AssumedModelSpec(1.0, user));
    }

    /// <summary>
    /// Runs the sampler over every epoch in order for one block of all trials; returns the clock component as phase
    /// error x = -(clock range) / c, indexed [satellite][trial][epoch], and the sampler (for its statistics).
    /// </summary>
    public static (double[][][] Phase, SatelliteErrorSampler Sampler) Run(Scenario scenario)
    {
        var constellation = Constellation.FromShells(scenario.Shells);
        int n = constellation.Count, trials = scenario.Run.Trials, epochs = scenario.Run.Epochs;
        var sampler = new SatelliteErrorSampler(scenario, scenario.Run.Seed);
        var states = new SatelliteState[n];
        var errors = new double[n * SatelliteErrorSampler.Components * trials];
        double angle0 = EarthRotation.EarthRotationAngle(scenario.Run.StartUtc);
        var phase = new double[n][][];
        for (int s = 0; s < n; s++)
        {
            phase[s] = new double[trials][];
            for (int j = 0; j < trials; j++)
            {
                phase[s][j] = new double[epochs];
            }
        }

        for (int e = 0; e < epochs; e++)
        {
            double t = scenario.Run.EpochTimeSeconds(e);
            constellation.Propagate(t, angle0, states);
            sampler.Sample(e, t, angle0 + Wgs84.EarthRotationRateRadPerSecond * t, states, 0, trials, trials, errors);
            for (int s = 0; s < n; s++)
            {
                for (int j = 0; j < trials; j++)
                {
                    phase[s][j][e] = -errors[SatelliteErrorSampler.IndexOf(s, 3, j, trials)] / PhysicalConstants.SpeedOfLight;
                }
            }
        }

        return (phase, sampler);
    }
}

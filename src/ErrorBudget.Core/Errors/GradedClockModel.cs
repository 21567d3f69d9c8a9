using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// What a graded [clock] implies: the simulator the sampler runs, and the closed-form clock error versus age of data.
/// </summary>
public static class GradedClockModel
{
    /// <summary>
    /// T_max of the flicker bank, as a multiple of the longest span the run looks at (its duration or the longest age of
    /// data): the bank's PSD follows h-1/f down to 1/T_max, so a margin of 4 keeps the longest ages inside the band.
    /// </summary>
    public const double FlickerSpanMargin = 4.0;

    /// <summary>Noise bandwidth of the simulated clocks: the Nyquist frequency 1 / (2 step) (Hz).</summary>
    public static double HighCutoffHz(double stepSeconds) => 0.5 / stepSeconds;

    /// <summary>T_max of the flicker bank for a scenario (s), at least 4 steps.</summary>
    public static double FlickerMaxCorrelationSeconds(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        double span = Math.Max(scenario.Run.DurationSeconds, new UploadSchedule(scenario, 0).MaxAgeSeconds);
        return Math.Max(4.0 * scenario.Run.StepSeconds, FlickerSpanMargin * span);
    }

    /// <summary>The simulator of the scenario's graded clock at the scenario step. Throws when the clock is not graded.</summary>
    public static ClockSimulator CreateSimulator(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        var noise = scenario.Clock.Noise ?? throw new InvalidOperationException("The scenario's clock has no grade.");
        return new ClockSimulator(noise, scenario.Run.StepSeconds, FlickerMaxCorrelationSeconds(scenario));
    }

    /// <summary>
    /// Variance (s^2) of the phase error at age of data <paramref name="ageSeconds"/>: the band-limited prediction-error
    /// variance of the two-state model (<see cref="TwoStateClockModel.PredictionErrorVariance(double, in PowerLawCoefficients, double)"/>,
    /// f_h = 1 / (2 step)) plus the estimation errors sigma_x^2 + (sigma_y age)^2. Excludes the drift (deterministic,
    /// see <see cref="DriftPhaseSeconds"/>).
    /// </summary>
    public static double PhaseErrorVariance(ClockSpec clock, double ageSeconds, double stepSeconds)
    {
        ArgumentNullException.ThrowIfNull(clock);
        var noise = clock.Noise ?? throw new InvalidOperationException("The clock has no grade.");
        double sx = clock.EstimationPhaseSigmaSeconds;
        double sy = clock.EstimationFrequencySigma * ageSeconds;
        return TwoStateClockModel.PredictionErrorVariance(ageSeconds, noise, HighCutoffHz(stepSeconds)) + sx * sx + sy * sy;
    }

    /// <summary>Mean phase error from the unmodelled drift at age of data <paramref name="ageSeconds"/>: D age^2 / 2 (s).</summary>
    public static double DriftPhaseSeconds(ClockSpec clock, double ageSeconds)
    {
        ArgumentNullException.ThrowIfNull(clock);
        return 0.5 * (clock.Noise?.DriftPerSecond ?? 0.0) * ageSeconds * ageSeconds;
    }

    /// <summary>
    /// Mean square (m^2) of the clock range error at age of data <paramref name="ageSeconds"/>, either model: simple
    /// sigma0^2 + (rate age)^2; graded c^2 (<see cref="PhaseErrorVariance"/> + <see cref="DriftPhaseSeconds"/>^2).
    /// </summary>
    public static double RangeMeanSquare(ClockSpec clock, double ageSeconds, double stepSeconds)
    {
        ArgumentNullException.ThrowIfNull(clock);
        if (!clock.IsGraded)
        {
            double rate = clock.GrowthSigmaMetersPerSecond * ageSeconds;
            return clock.UploadSigmaMeters * clock.UploadSigmaMeters + rate * rate;
        }

        double c = PhysicalConstants.SpeedOfLight;
        double drift = DriftPhaseSeconds(clock, ageSeconds);
        return c * c * (PhaseErrorVariance(clock, ageSeconds, stepSeconds) + drift * drift);
    }
}

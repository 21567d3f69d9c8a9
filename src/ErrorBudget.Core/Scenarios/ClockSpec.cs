using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [clock]: the satellite clock truth model and the upload schedule.
/// <para>Simple model (no <see cref="Grade"/>): at each upload the broadcast clock is reset with an
/// estimation error (offset) and a rate error; between uploads the error grows linearly with the
/// age of data: e(age) = offset + rate * age, so sigma(age)^2 = UploadSigma^2 + (RateSigma * age)^2.</para>
/// <para>Graded model (<see cref="Grade"/> set, <see cref="Noise"/> not null): each satellite clock is a
/// power-law noise process (<see cref="ClockSimulator"/>) reset at every upload to the ground estimation
/// error (<see cref="EstimationPhaseSigmaSeconds"/>, <see cref="EstimationFrequencySigma"/>).</para>
/// </summary>
/// <param name="UploadSigmaMeters">Simple model: range error just after an upload (1 sigma). Range: [0, 1000] m.</param>
/// <param name="GrowthSigmaMetersPerSecond">Simple model: rate error (1 sigma), in metres of range per second. Range: [0, 1] m/s.</param>
/// <param name="UploadIntervalSeconds">Default interval between uploads of a satellite (a shell may override it). Range: [60 s, 30 days].</param>
public sealed record ClockSpec(
    double UploadSigmaMeters,
    double GrowthSigmaMetersPerSecond,
    double UploadIntervalSeconds)
{
    /// <summary>Catalogue grade name or "custom"; null for the simple model.</summary>
    public string? Grade { get; init; }

    /// <summary>
    /// The resolved noise coefficients of the graded model (catalogue or fitted values, then the scenario's
    /// overrides; h1 = 0; drift in 1/s); null for the simple model.
    /// </summary>
    public PowerLawCoefficients? Noise { get; init; }

    /// <summary>The Allan deviation points a custom grade was fitted to, or null.</summary>
    public IReadOnlyList<AllanDeviationPoint>? AdevPoints { get; init; }

    /// <summary>rms relative error of the fitted sigma_y at <see cref="AdevPoints"/> (dimensionless), or null without points.</summary>
    public double? AdevFitRelativeRms { get; init; }

    /// <summary>Standard deviation of each upload's time jitter, per satellite and upload. Range: [0, interval / 10] s.</summary>
    public double UploadJitterSeconds { get; init; }

    /// <summary>Shape of the upload jitter (same standard deviation either way).</summary>
    public UploadJitterDistribution JitterDistribution { get; init; } = UploadJitterDistribution.Uniform;

    /// <summary>Graded model: phase (time) estimation error at each upload, 1 sigma. Range: [0, 1e-3] s.</summary>
    public double EstimationPhaseSigmaSeconds { get; init; } = 1e-9;

    /// <summary>Graded model: fractional-frequency estimation error at each upload, 1 sigma (dimensionless). Range: [0, 1e-6].</summary>
    public double EstimationFrequencySigma { get; init; } = 1e-14;

    /// <summary>True when the clock is a noise process (a grade is set).</summary>
    public bool IsGraded => Noise is not null;
}

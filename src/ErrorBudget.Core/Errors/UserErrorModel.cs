using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// User-level range error sigmas for one satellite as a function of elevation (ionosphere, troposphere,
/// multipath, receiver noise), independent per user, satellite and epoch. Immutable; built from a
/// <see cref="UserEnvironmentSpec"/>.
/// </summary>
public sealed class UserErrorModel
{
    private readonly bool _dualFrequency;
    private readonly double _ionoVerticalSigmaMeters;
    private readonly double _tropoZenithSigmaMeters;
    private readonly MultipathModel _multipath;
    private readonly double _noiseSigmaMeters;

    /// <summary>Multiplies multipath and noise: the iono-free factor for dual frequency, 1 otherwise.</summary>
    private readonly double _amplification;

    private UserErrorModel(UserEnvironmentSpec spec)
    {
        _dualFrequency = spec.Ionosphere == IonosphereMode.DualFrequency;
        _ionoVerticalSigmaMeters = spec.IonoVerticalSigmaMeters;
        _tropoZenithSigmaMeters = spec.TropoZenithSigmaMeters;
        _multipath = spec.Multipath;
        _noiseSigmaMeters = spec.NoiseSigmaMeters;
        _amplification = _dualFrequency ? IonosphereModel.IonoFreeNoiseFactor(spec.Pair) : 1.0;
    }

    /// <summary>Builds the model of a user environment.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A sigma is negative or not finite, or an enum value is unknown.</exception>
    public static UserErrorModel From(UserEnvironmentSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        RequireSigma(spec.IonoVerticalSigmaMeters, nameof(spec.IonoVerticalSigmaMeters));
        RequireSigma(spec.TropoZenithSigmaMeters, nameof(spec.TropoZenithSigmaMeters));
        RequireSigma(spec.NoiseSigmaMeters, nameof(spec.NoiseSigmaMeters));
        if (!Enum.IsDefined(spec.Ionosphere))
        {
            throw new ArgumentOutOfRangeException(nameof(spec), spec.Ionosphere, "Unknown ionosphere mode.");
        }

        _ = MultipathModels.Sigma(spec.Multipath, Math.PI / 2); // rejects an unknown multipath model now
        return new UserErrorModel(spec);
    }

    /// <summary>
    /// Total user-level range variance of one satellite, m². Single frequency:
    /// (σ_iono,v F)² + σ_tropo² + σ_mp² + σ_noise²; dual frequency: σ_tropo² + k² (σ_mp² + σ_noise²).
    /// </summary>
    /// <param name="elevationRad">Elevation, rad. Range: [0, π/2].</param>
    public double RangeVariance(double elevationRad)
    {
        Components(elevationRad, out double iono, out double tropo, out double multipath, out double noise);
        return (iono * iono) + (tropo * tropo) + (multipath * multipath) + (noise * noise);
    }

    /// <summary>
    /// Per-source range sigmas after amplification, m, so that their squares add up to
    /// <see cref="RangeVariance"/>: ionosphere (σ_iono,v × obliquity, or 0 for dual frequency: first-order
    /// delay removed), troposphere (σ_zenith × mapping), multipath and noise (× k for dual frequency).
    /// </summary>
    /// <param name="elevationRad">Elevation, rad. Range: [0, π/2].</param>
    public void Components(
        double elevationRad, out double iono, out double tropo, out double multipath, out double noise)
    {
        iono = _dualFrequency ? 0.0 : _ionoVerticalSigmaMeters * IonosphereModel.Obliquity(elevationRad);
        tropo = TroposphereModel.Sigma(_tropoZenithSigmaMeters, elevationRad);
        multipath = _amplification * MultipathModels.Sigma(_multipath, elevationRad);
        noise = _amplification * _noiseSigmaMeters;
    }

    private static void RequireSigma(double sigmaMeters, string name)
    {
        if (!(sigmaMeters >= 0.0) || !double.IsFinite(sigmaMeters))
        {
            throw new ArgumentOutOfRangeException(name, sigmaMeters, "A sigma must be finite and non-negative.");
        }
    }
}

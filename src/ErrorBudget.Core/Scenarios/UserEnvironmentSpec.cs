namespace ErrorBudget.Core.Scenarios;

/// <summary>Which ionosphere treatment the user receiver applies.</summary>
public enum IonosphereMode
{
    /// <summary>Single frequency with a broadcast model: the residual is a vertical sigma times the obliquity factor.</summary>
    SingleFrequency,

    /// <summary>Dual-frequency ionosphere-free combination: first-order delay removed, noise and multipath amplified.</summary>
    DualFrequency,
}

/// <summary>The frequency pair of a dual-frequency user.</summary>
public enum FrequencyPair
{
    L1L2,
    L1L5,
}

/// <summary>Elevation-dependent multipath model of the user.</summary>
public enum MultipathModel
{
    None,

    /// <summary>RTCA DO-229 appendix J airborne model: 0.13 + 0.53 exp(-el / 10 deg) m.</summary>
    Airborne,

    /// <summary>Static ground antenna: a0 + a1 exp(-el / el0), representative values (see MultipathSigma).</summary>
    Ground,
}

/// <summary>
/// [user]: the truth of the user-level errors, independent per user, satellite and epoch.
/// </summary>
/// <param name="Ionosphere">Ionosphere treatment.</param>
/// <param name="IonoVerticalSigmaMeters">Single-frequency vertical residual (1 sigma) at zenith. Range: [0, 100] m.</param>
/// <param name="Pair">Dual-frequency pair (noise amplification).</param>
/// <param name="TropoZenithSigmaMeters">Troposphere residual at zenith, scaled by the DO-229 mapping. Range: [0, 10] m.</param>
/// <param name="Multipath">Multipath model.</param>
/// <param name="NoiseSigmaMeters">Receiver noise (1 sigma, single frequency). Range: [0, 100] m.</param>
public sealed record UserEnvironmentSpec(
    IonosphereMode Ionosphere,
    double IonoVerticalSigmaMeters,
    FrequencyPair Pair,
    double TropoZenithSigmaMeters,
    MultipathModel Multipath,
    double NoiseSigmaMeters);

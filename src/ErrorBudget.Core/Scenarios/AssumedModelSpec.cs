namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [assumed]: the error model the user's receiver believes, used for weights (and later protection
/// levels). Configured apart from the truth on purpose: the gap between the two is what an analyst
/// wants to see. Keys left out default to the truth's user environment.
/// </summary>
/// <param name="UreSigmaMeters">Assumed satellite-level user range error (clock + orbit), 1 sigma. Range: (0, 1000] m.</param>
/// <param name="User">Assumed user-level environment.</param>
public sealed record AssumedModelSpec(double UreSigmaMeters, UserEnvironmentSpec User);

namespace ErrorBudget.Core.Scenarios;

/// <summary>[orbit]: broadcast-orbit error, 1 sigma per radial / along-track / cross-track axis, metres. Range: [0, 1000] m.</summary>
public sealed record OrbitErrorSpec(double RadialSigmaMeters, double AlongSigmaMeters, double CrossSigmaMeters);

namespace ErrorBudget.Core.Clocks;

/// <summary>One measured or specified Allan deviation point.</summary>
/// <param name="TauSeconds">Averaging time tau. Range: &gt; 0 s.</param>
/// <param name="Sigma">Allan deviation sigma_y(tau), dimensionless. Range: &gt; 0.</param>
public readonly record struct AllanDeviationPoint(double TauSeconds, double Sigma);

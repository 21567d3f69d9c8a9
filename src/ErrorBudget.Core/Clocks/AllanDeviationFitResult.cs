namespace ErrorBudget.Core.Clocks;

/// <summary>Outcome of <see cref="AllanDeviationFit.Fit"/>.</summary>
/// <param name="Coefficients">Fitted non-negative coefficients (h1 = 0; drift &gt;= 0 when fitted, else 0).</param>
/// <param name="RelativeRmsResidual">rms over the points of (sigma_fit / sigma_measured - 1), dimensionless.</param>
/// <param name="RelativeResiduals">Per point (sigma_fit / sigma_measured - 1), in the order given.</param>
public sealed record AllanDeviationFitResult(
    PowerLawCoefficients Coefficients,
    double RelativeRmsResidual,
    IReadOnlyList<double> RelativeResiduals);

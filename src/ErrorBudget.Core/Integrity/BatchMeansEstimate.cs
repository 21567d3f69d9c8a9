namespace ErrorBudget.Core.Integrity;

/// <summary>
/// The mean of B batch estimates and its Student-t confidence interval (see <see cref="BatchMeansInterval"/>).
/// Units are those of the batch estimates.
/// </summary>
/// <param name="Mean">x̄ = (1/B) Σ xⱼ.</param>
/// <param name="StandardError">s/√B, s² = Σ (xⱼ − x̄)² / (B − 1). Range: ≥ 0.</param>
/// <param name="HalfWidth">t_{(1+c)/2, B−1} · s/√B for confidence c. Range: ≥ 0.</param>
/// <param name="Lower">x̄ − HalfWidth.</param>
/// <param name="Upper">x̄ + HalfWidth.</param>
internal readonly record struct BatchMeansEstimate(double Mean, double StandardError, double HalfWidth, double Lower, double Upper);

using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>Elevation-dependent code multipath sigmas of the user antenna, m (single frequency).</summary>
public static class MultipathModels
{
    private const double DegPerRad = 180.0 / Math.PI;

    /// <summary>Airborne multipath σ = 0.13 + 0.53 exp(−θ/10°) m (RTCA DO-229 appendix J.2.4).</summary>
    /// <param name="elevationRad">Elevation θ, rad. Range: [0, π/2].</param>
    public static double Airborne(double elevationRad) =>
        0.13 + (0.53 * Math.Exp(-elevationRad * DegPerRad / 10.0));

    /// <summary>
    /// Representative static ground antenna σ = a0 + a1 exp(−θ/θ0) m with the ground accuracy designator A
    /// curve of RTCA DO-245A: a0 = 0.5 m, a1 = 1.65 m, θ0 = 14.3° (coefficients from memory, representative).
    /// </summary>
    /// <param name="elevationRad">Elevation θ, rad. Range: [0, π/2].</param>
    public static double Ground(double elevationRad) =>
        0.5 + (1.65 * Math.Exp(-elevationRad * DegPerRad / 14.3));

    /// <summary>Multipath σ of the given model, m; <see cref="MultipathModel.None"/> gives 0.</summary>
    /// <param name="model">Multipath model.</param>
    /// <param name="elevationRad">Elevation, rad. Range: [0, π/2].</param>
    public static double Sigma(MultipathModel model, double elevationRad) => model switch
    {
        MultipathModel.None => 0.0,
        MultipathModel.Airborne => Airborne(elevationRad),
        MultipathModel.Ground => Ground(elevationRad),
        _ => throw new ArgumentOutOfRangeException(nameof(model), model, "Unknown multipath model."),
    };
}

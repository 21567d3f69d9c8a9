namespace ErrorBudget.Core.Scenarios;

/// <summary>Shape of the per-upload time jitter; both have the standard deviation <see cref="ClockSpec.UploadJitterSeconds"/>.</summary>
public enum UploadJitterDistribution
{
    /// <summary>Uniform over [-sqrt(3) J, +sqrt(3) J].</summary>
    Uniform,

    /// <summary>Normal N(0, J^2), clamped to +-4 J so uploads stay in order.</summary>
    Gaussian,
}

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The reported percentiles of one error quantity, metres. A value is NaN where fewer than
/// 1 / (1 - q) samples stand behind it (a tail the sample count cannot support) or there are none.
/// </summary>
public readonly record struct PercentileSet(double P50, double P95, double P99, double P999)
{
    public static readonly PercentileSet Empty = new(double.NaN, double.NaN, double.NaN, double.NaN);

    /// <summary>The quantile levels in the order of the fields.</summary>
    public static readonly double[] Levels = [0.50, 0.95, 0.99, 0.999];
}

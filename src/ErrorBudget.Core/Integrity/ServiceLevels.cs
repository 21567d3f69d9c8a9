using System.Diagnostics.CodeAnalysis;

namespace ErrorBudget.Core.Integrity;

/// <summary>
/// Service-level presets from ICAO Annex 10, Vol. I, Table 3.7.2.4-1 (GNSS signal-in-space performance
/// requirements), as reproduced in Table 1 of "Advances in BeiDou Navigation Satellite System (BDS) and
/// satellite navigation augmentation technologies", Satellite Navigation (2020), doi 10.1186/s43020-020-00010-2
/// (REFERENCE-VALUES §6). K factors: RTCA DO-229 appendix J (from memory, REFERENCE-VALUES §4).
/// </summary>
/// <remarks>
/// The table gives integrity as 1 − risk; the risk is stored. Continuity and availability are not encoded
/// (the table gives NPA continuity as a range, 1 − 1e-4 … 1 − 1e-8 per hour).
/// </remarks>
internal static class ServiceLevels
{
    /// <summary>Name of a level built by <see cref="Custom"/>.</summary>
    public const string CustomName = "custom";

    private static readonly ServiceLevel[] Presets =
    [
        // NPA: accuracy 220 m (H), alert limit 556 m (H), integrity 1 − 1e-7 per hour; no vertical guidance.
        new("npa", 556.0, double.NaN, 220.0, double.NaN, 1e-7, "hour",
            WeightedProtectionLevels.KHorizontalNonPrecision, WeightedProtectionLevels.KVerticalPrecision),
        // APV-I: 16 m / 20 m accuracy, 40 m / 50 m alert limits, 1 − 2e-7 per approach.
        new("apv-i", 40.0, 50.0, 16.0, 20.0, 2e-7, "approach",
            WeightedProtectionLevels.KHorizontalPrecision, WeightedProtectionLevels.KVerticalPrecision),
        // APV-II: 16 m / 8 m accuracy, 40 m / 20 m alert limits, 1 − 2e-7 per approach.
        new("apv-ii", 40.0, 20.0, 16.0, 8.0, 2e-7, "approach",
            WeightedProtectionLevels.KHorizontalPrecision, WeightedProtectionLevels.KVerticalPrecision),
        // LPV-200: 16 m / 4 m accuracy, 40 m / 35 m alert limits, 1 − 2e-7 per approach.
        new("lpv-200", 40.0, 35.0, 16.0, 4.0, 2e-7, "approach",
            WeightedProtectionLevels.KHorizontalPrecision, WeightedProtectionLevels.KVerticalPrecision),
    ];

    /// <summary>The preset keys, in table order: "npa", "apv-i", "apv-ii", "lpv-200".</summary>
    public static IReadOnlyList<string> Keys { get; } = Array.AsReadOnly(Array.ConvertAll(Presets, p => p.Name));

    /// <summary>The preset with this key (ordinal, case-insensitive); false and null when there is none.</summary>
    /// <exception cref="ArgumentNullException"><paramref name="key"/> is null.</exception>
    public static bool TryGet(string key, [NotNullWhen(true)] out ServiceLevel? level)
    {
        ArgumentNullException.ThrowIfNull(key);
        foreach (var preset in Presets)
        {
            if (string.Equals(preset.Name, key, StringComparison.OrdinalIgnoreCase))
            {
                level = preset;
                return true;
            }
        }

        level = null;
        return false;
    }

    /// <summary>
    /// A level with the given alert limits and the approach figures of the presets with vertical guidance:
    /// integrity risk 2e-7 per approach, K_H = 6.0, K_V = 5.33, no accuracy requirement (NaN).
    /// </summary>
    /// <param name="halMeters">HAL, m. Range: 0 &lt; HAL &lt; ∞.</param>
    /// <param name="valMeters">VAL, m. Range: 0 &lt; VAL &lt; ∞.</param>
    /// <exception cref="ArgumentOutOfRangeException">An alert limit is not &gt; 0 and finite.</exception>
    public static ServiceLevel Custom(double halMeters, double valMeters)
    {
        RequireAlertLimit(halMeters, nameof(halMeters));
        RequireAlertLimit(valMeters, nameof(valMeters));
        return new ServiceLevel(
            CustomName, halMeters, valMeters, double.NaN, double.NaN, 2e-7, "approach",
            WeightedProtectionLevels.KHorizontalPrecision, WeightedProtectionLevels.KVerticalPrecision);
    }

    private static void RequireAlertLimit(double meters, string name)
    {
        if (!(meters > 0.0) || !double.IsFinite(meters))
        {
            throw new ArgumentOutOfRangeException(name, meters, $"{name}: an alert limit must be in (0, +inf) metres.");
        }
    }
}

using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>GPS carrier frequencies, Hz: L1 = 154, L2 = 120, L5 = 115 × 10.23 MHz (IS-GPS-200, IS-GPS-705).</summary>
internal static class CarrierFrequencies
{
    public const double L1Hz = 1575.42e6;
    public const double L2Hz = 1227.60e6;
    public const double L5Hz = 1176.45e6;

    /// <summary>The two frequencies (f1 &gt; f2) of a dual-frequency pair, Hz.</summary>
    public static (double F1Hz, double F2Hz) Of(FrequencyPair pair) => pair switch
    {
        FrequencyPair.L1L2 => (L1Hz, L2Hz),
        FrequencyPair.L1L5 => (L1Hz, L5Hz),
        _ => throw new ArgumentOutOfRangeException(nameof(pair), pair, "Unknown frequency pair."),
    };
}

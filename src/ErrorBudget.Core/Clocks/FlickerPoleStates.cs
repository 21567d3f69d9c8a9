using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Clocks;

/// <summary>Fixed-size inline buffer of the Gauss-Markov pole states (fractional frequency), no heap allocation.</summary>
[InlineArray(FlickerFrequencyBank.MaxPoles)]
public struct FlickerPoleStates
{
    private double _element0;
}

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// State of one simulated clock error (truth minus broadcast), advanced by <see cref="ClockSimulator"/>.
/// A plain struct of doubles (8 + 8 + 8 * <see cref="FlickerFrequencyBank.MaxPoles"/> bytes) so the engine can keep
/// one per (trial, satellite) in an array.
/// </summary>
public struct ClockState
{
    /// <summary>Phase error x (s), without the white PM added at output.</summary>
    public double PhaseSeconds;

    /// <summary>
    /// Two-state frequency part (s/s): random-walk FM, drift and the upload offset. The total fractional-frequency
    /// error is this plus the sum of <see cref="Poles"/> (see <see cref="ClockSimulator.FrequencyError"/>).
    /// </summary>
    public double FrequencyOffset;

    /// <summary>Flicker FM Gauss-Markov pole states (s/s); only the first PoleCount are used.</summary>
    public FlickerPoleStates Poles;
}

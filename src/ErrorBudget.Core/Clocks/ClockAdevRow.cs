namespace ErrorBudget.Core.Clocks;

/// <summary>The model and the simulated Allan deviation of one clock grade at one averaging time.</summary>
/// <param name="Grade">Grade name as in the scenario ("rubidium", "custom", ...).</param>
/// <param name="Octave">k in tau = step x 2^k, from 0.</param>
/// <param name="TauSeconds">Averaging time tau, s.</param>
/// <param name="ModelAdev">sigma_y(tau) of the power-law coefficients (with drift), f_h = 1 / (2 step); dimensionless.</param>
/// <param name="SimulatedAdev">Overlapping ADEV measured on the free-running reference clocks (pooled Allan variance); dimensionless.</param>
/// <param name="Clocks">Reference clocks pooled.</param>
/// <param name="PhasePoints">Phase samples per reference clock.</param>
public sealed record ClockAdevRow(
    string Grade,
    int Octave,
    double TauSeconds,
    double ModelAdev,
    double SimulatedAdev,
    int Clocks,
    int PhasePoints);

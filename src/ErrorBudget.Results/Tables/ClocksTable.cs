using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Results.Tables;

/// <summary>clocks.parquet: per clock grade in use, the model and the simulated Allan deviation at tau = step x 2^k.</summary>
internal static class ClocksTable
{
    public static TableDefinition<ClockAdevRow> Definition { get; } = new(
        name: "clocks",
        fileName: ResultSetLayout.ClocksFileName,
        title: "Clock grade: model and simulated Allan deviation",
        description: "One row per averaging time tau = step x 2^k of the clock grade in use (no rows for the simple clock "
            + "model): sigma_y(tau) of the grade's power-law coefficients, and the overlapping Allan deviation measured on "
            + "free-running reference clocks simulated with the same simulator, step and span as the satellite clocks "
            + "(no uploads), so the two columns show whether the simulation honours the model.",
        primaryKey: "tau_s",
        columns:
        [
            new StringColumn<ClockAdevRow>("grade", null, "Clock grade as named in the scenario: a catalogue grade or \"custom\".", r => r.Grade),
            new Int32Column<ClockAdevRow>("octave", "1", "k in tau = step x 2^k, from 0.", r => r.Octave, minimum: 0),
            new DoubleColumn<ClockAdevRow>("tau_s", false, "s", "Averaging time tau.", r => r.TauSeconds, minimum: 0),
            new DoubleColumn<ClockAdevRow>("model_adev", false, "1", "Allan deviation sigma_y(tau) of the grade's power-law coefficients and drift (IEEE Std 1139 relations), white PM with the simulated bandwidth f_h = 1 / (2 step).", r => r.ModelAdev, minimum: 0),
            new DoubleColumn<ClockAdevRow>("simulated_adev", false, "1", "Overlapping Allan deviation (NIST SP 1065 eq. 14) of the simulated reference clocks' phase, Allan variances averaged over the clocks.", r => r.SimulatedAdev, minimum: 0),
            new Int32Column<ClockAdevRow>("clocks", "1", "Reference clocks pooled in simulated_adev.", r => r.Clocks, minimum: 1),
            new Int32Column<ClockAdevRow>("phase_points", "1", "Phase samples per reference clock (the run's epochs plus one).", r => r.PhasePoints, minimum: 1),
        ]);
}

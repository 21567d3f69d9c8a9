using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Tables;

/// <summary>
/// overbound.parquet (issue 5): per (shell, elevation bin), whether the receiver's assumed sigma
/// CDF-overbounds the simulated truth range errors; no rows without [integrity].
/// </summary>
internal static class OverboundTable
{
    public static TableDefinition<OverboundRow> Definition { get; } = new(
        name: "overbound",
        fileName: ResultSetLayout.OverboundFileName,
        title: "Overbounding check of the assumed range-error model",
        description: "Per shell and 10-degree elevation bin: the truth range errors (satellite clock, orbit, relativity and faults "
            + "as simulated, plus the user-level errors) of the sampled trials, divided by the receiver's integrity sigma, and the "
            + "smallest inflation k of that sigma for which a zero-mean Gaussian two-sided CDF-overbounds them (DeCleene). "
            + "k <= 1 + sampling_tolerance: the assumption holds; above: it fails.",
        primaryKey: "shell,elevation_low_deg",
        columns:
        [
            new StringColumn<OverboundRow>("shell", null, "Name of the satellites' shell.", r => r.Shell),
            new DoubleColumn<OverboundRow>("elevation_low_deg", false, "deg", "Lower edge of the elevation bin.", r => r.ElevationLowDeg, 0, 90),
            new DoubleColumn<OverboundRow>("elevation_high_deg", false, "deg", "Upper edge of the elevation bin.", r => r.ElevationHighDeg, 0, 90),
            new Int64Column<OverboundRow>("samples", "1", "Normalised range errors in the bin.", r => r.Samples, minimum: 1),
            new DoubleColumn<OverboundRow>("mean", false, "1", "Mean of the normalised errors (a bias shows here).", r => r.Mean),
            new DoubleColumn<OverboundRow>("sigma_ratio", true, "1", "Standard deviation of the normalised errors: truth sigma over assumed sigma.", r => r.SigmaRatio, minimum: 0),
            new DoubleColumn<OverboundRow>("required_inflation", true, "1", "Smallest k for which N(0, k^2) overbounds the errors over the checked range; infinite when no zero-mean Gaussian can (the median is off zero); null with too few samples.", r => r.RequiredInflation, minimum: 0),
            new DoubleColumn<OverboundRow>("tail_probability_checked", true, "1", "Smallest tail probability at which the overbound was checked (the rule needs 20 samples beyond an edge).", r => r.TailProbabilityChecked, 0, 1),
            new DoubleColumn<OverboundRow>("sampling_tolerance", true, "1", "Relative sampling uncertainty of required_inflation (union bound, false alarm 1e-3).", r => r.SamplingTolerance, minimum: 0),
            new Int32Column<OverboundRow>("bounded", "1", "1 when required_inflation <= 1 + sampling_tolerance (the assumed sigma overbounds within the sampling uncertainty), else 0 (fails, or no verdict).", r => r.Bounded ? 1 : 0, minimum: 0),
        ]);
}

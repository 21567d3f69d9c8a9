using ErrorBudget.Core.Integrity.Araim;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// The solver's subsets, sigmas, thresholds, EMT, σ_acc, P_not_monitored and protection levels against an
/// independent dense-matrix evaluation of the MHSS equations (REFERENCE-VALUES §5; ADD v3.0, from memory).
/// </summary>
public class ProtectionLevelEquationTests
{
    /// <summary>Same algebra by two routes (Cholesky 4 × 4 vs MathNet LU inverse): agreement to 1e-9 relative.</summary>
    private const double RelativeTolerance = 1e-9;

    private static readonly AraimParameters Baseline = new();

    private static void Close(double expected, double actual, string what) =>
        Assert.True(Math.Abs(expected - actual) <= RelativeTolerance * Math.Max(1.0, Math.Abs(expected)), $"{what}: expected {expected}, got {actual}");

    [Fact]
    public void Fault_modes_are_every_satellite_and_every_constellation_with_their_priors()
    {
        var sky = AraimFixtures.TwoConstellations(new System.Random(11), 6, Baseline);
        var solver = new AraimSolver(16, Baseline);
        Assert.True(sky.Evaluate(solver, out AraimResult result));

        Assert.Equal(sky.Count + 2, result.FaultModes);
        Assert.Equal(0, result.UnmonitorableModes);
        for (int k = 0; k < solver.ModeCount; k++)
        {
            FaultModeInfo mode = solver.Mode(k);
            int removed = Enumerable.Range(0, sky.Count).Count(i => solver.Removes(k, i));
            if (mode.Kind == FaultModeKind.Satellite)
            {
                Assert.Equal(Baseline.PSat, mode.Prior);
                Assert.Equal(1, removed);
                Assert.True(solver.Removes(k, mode.Satellite));
                Assert.Equal(sky.Constellation[mode.Satellite], mode.ConstellationId);
            }
            else
            {
                Assert.Equal(Baseline.PConst, mode.Prior);
                Assert.All(Enumerable.Range(0, sky.Count), i => Assert.Equal(sky.Constellation[i] == mode.ConstellationId, solver.Removes(k, i)));
                Assert.Equal(6, removed);
            }

            Assert.Equal(sky.Count - removed, mode.SatellitesUsed);
        }
    }

    [Fact]
    public void Sigmas_biases_thresholds_emt_and_accuracy_match_a_dense_matrix_reference()
    {
        var rng = new System.Random(2024);
        var solver = new AraimSolver(16, Baseline);
        for (int trial = 0; trial < 10; trial++)
        {
            var sky = AraimFixtures.TwoConstellations(rng, 5 + (trial % 3), Baseline);
            Assert.True(sky.Evaluate(solver, out AraimResult result));
            var reference = ReferenceMhss.ForSolver(solver, sky, Baseline, result.UnmonitoredPrior);

            for (int q = 0; q < 3; q++)
            {
                Close(reference.Sigma0[q], solver.FaultFreeSigmaMeters(q), "sigma0");
                Close(reference.Bias0[q], solver.FaultFreeBiasMeters(q), "b0");
                for (int k = 0; k < solver.ModeCount; k++)
                {
                    var mode = reference.Modes[k];
                    Close(mode.Sigma[q], solver.ModeSigmaMeters(k, q), "sigma_k");
                    Close(mode.Bias[q], solver.ModeBiasMeters(k, q), "b_k");
                    Close(mode.SigmaSs[q], solver.SeparationSigmaMeters(k, q), "sigma_ss");
                    Close(mode.Threshold[q], solver.ThresholdMeters(k, q), "T_kq");
                }
            }

            // σ_acc = √(e₃ᵀ S⁽⁰⁾ C_acc S⁽⁰⁾ᵀ e₃); EMT = max T_k,3 over p_k ≥ P_EMT (both §5).
            double sigmaAcc = Math.Sqrt(Enumerable.Range(0, sky.Count).Sum(i => reference.S0[2, i] * reference.S0[2, i] * sky.AccuracyVariance[i]));
            Close(sigmaAcc, result.SigmaAccuracyVerticalMeters, "sigma_acc");
            double emt = reference.Modes.Where(m => m.Prior >= Baseline.PEmt).Max(m => m.Threshold[2]);
            Close(emt, result.EffectiveMonitorThresholdMeters, "EMT");
        }
    }

    [Fact]
    public void Unmonitored_prior_is_the_probability_of_two_or_more_independent_faults()
    {
        var sky = AraimFixtures.TwoConstellations(new System.Random(5), 6, Baseline);
        var solver = new AraimSolver(16, Baseline);
        Assert.True(sky.Evaluate(solver, out AraimResult result));

        // Events: 12 satellites (P_sat each) and 2 constellations (P_const each); closed form in decimal arithmetic.
        var priors = Enumerable.Repeat(Baseline.PSat, 12).Concat(Enumerable.Repeat(Baseline.PConst, 2)).ToList();
        double expected = ReferenceMhss.TwoOrMore(priors);
        Assert.Equal(expected, result.UnmonitoredPrior, 1e-9 * expected); // relative 1e-9: both routes are accurate to ~1e-15 absolute
        Assert.True(result.UnmonitoredWithinThreshold); // ≈ 3.4e-8 ≤ P_THRES = 8e-8
    }

    [Fact]
    public void Vpl_and_hpl_are_within_tol_pl_above_the_exact_root_of_the_integrity_risk_equation()
    {
        var rng = new System.Random(77);
        var solver = new AraimSolver(16, Baseline);
        double tol = Baseline.TolPlMeters;
        for (int trial = 0; trial < 10; trial++)
        {
            var sky = AraimFixtures.TwoConstellations(rng, 5 + (trial % 3), Baseline);
            Assert.True(sky.Evaluate(solver, out AraimResult result));
            var reference = ReferenceMhss.ForSolver(solver, sky, Baseline, result.UnmonitoredPrior);

            // The half-interval search returns the upper end of a bracket narrower than TOL_PL around the root
            // (1e-6 m slack for the reference root finder).
            double vRoot = reference.Root(2);
            Assert.InRange(result.VplMeters, vRoot - 1e-6, vRoot + tol + 1e-6);
            Assert.True(reference.Risk(2, result.VplMeters) <= reference.Target(2) * (1 + 1e-9), "VPL meets the vertical allocation");

            double eRoot = reference.Root(0), nRoot = reference.Root(1);
            double hLow = Math.Sqrt((eRoot * eRoot) + (nRoot * nRoot)) - 1e-6;
            double hHigh = Math.Sqrt(((eRoot + tol) * (eRoot + tol)) + ((nRoot + tol) * (nRoot + tol))) + 1e-6;
            Assert.InRange(result.HplMeters, hLow, hHigh);
        }
    }
}

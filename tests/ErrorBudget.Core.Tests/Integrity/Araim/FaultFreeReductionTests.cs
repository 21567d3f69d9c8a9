using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Tests.Geometry;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// With no faults allowed (P_sat = P_const = 0) and b_nom = 0 the PL equation keeps only its fault-free term
/// 2Q(PL/σ⁽⁰⁾) = PHMI, so VPL = Q⁻¹(PHMI_VERT/2)·σ_U⁽⁰⁾ (REFERENCE-VALUES suggested check 26) and, per horizontal
/// axis, HPL_q = Q⁻¹(PHMI_HOR/4)·σ_q⁽⁰⁾ (derived from the same equation with PHMI_HOR/2 per axis).
/// </summary>
public class FaultFreeReductionTests
{
    private static readonly AraimParameters NoFaults = new() { PSat = 0.0, PConst = 0.0, NominalBiasIntegrityMeters = 0.0 };

    [Fact]
    public void Without_faults_and_biases_vpl_is_the_gaussian_quantile_of_the_vertical_sigma()
    {
        var rng = new System.Random(26);
        var solver = new AraimSolver(12, NoFaults);
        double kV = -Normal.InvCDF(0, 1, NoFaults.PhmiVertical / 2); // Q⁻¹(4.9e-8) ≈ 5.33
        double kH = -Normal.InvCDF(0, 1, NoFaults.PhmiHorizontal / 4);
        for (int trial = 0; trial < 30; trial++)
        {
            var sky = AraimFixtures.RandomSky(rng, rng.Next(5, 13), NoFaults);
            Assert.True(sky.Evaluate(solver, out AraimResult result));

            // σ⁽⁰⁾ from an independent inverse: D = (GᵀWG)⁻¹, σ_U = √D₃₃ (REFERENCE-VALUES §4 "WLS").
            var g = GeometryFixtures.GeometryMatrix(sky.LineOfSight);
            var w = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseOfDiagonalArray(sky.IntegrityVariance.Select(v => 1 / v).ToArray());
            var d = (g.Transpose() * w * g).Inverse();

            Assert.Equal(0, result.FaultModes);
            Assert.Equal(0.0, result.UnmonitoredPrior);
            Assert.Equal(0.0, result.EffectiveMonitorThresholdMeters);
            Assert.InRange(result.VplMeters, (kV * Math.Sqrt(d[2, 2])) - NoFaults.TolPlMeters, (kV * Math.Sqrt(d[2, 2])) + NoFaults.TolPlMeters);
            double hpl = kH * Math.Sqrt(d[0, 0] + d[1, 1]);
            Assert.InRange(result.HplMeters, hpl - NoFaults.TolPlMeters, hpl + NoFaults.TolPlMeters);
        }
    }

    [Fact]
    public void The_vertical_factor_is_about_5_33()
    {
        // REFERENCE-VALUES §4: K_V,PA = 5.33 ≈ Q⁻¹(0.5e-7) = 5.3267 (derived); with PHMI_VERT = 9.8e-8, Q⁻¹(4.9e-8) = 5.331.
        var solver = new AraimSolver(8, NoFaults);
        var sky = AraimFixtures.Build(
            GeometryFixtures.FromAzEl((0, 90), (0, 30), (90, 30), (180, 30), (270, 30)), new int[5], NoFaults, 1.0);
        Assert.True(sky.Evaluate(solver, out AraimResult result));
        Assert.Equal(5.331, result.VplMeters / solver.FaultFreeSigmaMeters(2), 0.001 + (NoFaults.TolPlMeters / solver.FaultFreeSigmaMeters(2)));
    }
}

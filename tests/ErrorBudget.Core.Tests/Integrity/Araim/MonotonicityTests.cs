using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Tests.Geometry;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// Suggested check 26 (REFERENCE-VALUES): the PL search is monotone in σ and in b_nom, and adding a satellite
/// never increases σ_U⁽⁰⁾. The searched value lies in [root, root + TOL_PL], so monotone roots give
/// PL(larger) ≥ PL(smaller) − TOL_PL, the tolerance used below.
/// </summary>
public class MonotonicityTests
{
    private static readonly AraimParameters Baseline = new();

    [Fact]
    public void Vpl_and_hpl_do_not_fall_as_sigma_ura_grows()
    {
        var rng = new System.Random(303);
        var solver = new AraimSolver(16, Baseline);
        double tol = Baseline.TolPlMeters;
        for (int trial = 0; trial < 10; trial++)
        {
            var geometry = AraimFixtures.TwoConstellations(rng, 5 + (trial % 3), Baseline);
            double previousV = 0, previousH = 0;
            for (double sigmaUra = 0.25; sigmaUra <= 3.0; sigmaUra += 0.25)
            {
                var sky = AraimFixtures.Build(geometry.LineOfSight, geometry.Constellation, Baseline, sigmaUra);
                Assert.True(sky.Evaluate(solver, out AraimResult result));
                Assert.True(result.VplMeters >= previousV - tol, $"VPL fell at sigma_URA {sigmaUra}: {previousV} -> {result.VplMeters}");
                Assert.True(result.HplMeters >= previousH - tol, $"HPL fell at sigma_URA {sigmaUra}: {previousH} -> {result.HplMeters}");
                previousV = result.VplMeters;
                previousH = result.HplMeters;
            }
        }
    }

    [Fact]
    public void Vpl_and_hpl_do_not_fall_as_the_nominal_bias_grows()
    {
        // b enters only through b_q⁽ᵏ⁾ = Σᵢ |S_q,i⁽ᵏ⁾| b_nom,i, which raises every term of the risk: the root rises (derived).
        var rng = new System.Random(304);
        var solver = new AraimSolver(16, Baseline);
        double tol = Baseline.TolPlMeters;
        for (int trial = 0; trial < 10; trial++)
        {
            var geometry = AraimFixtures.TwoConstellations(rng, 6, Baseline);
            double previousV = 0, previousH = 0, firstV = 0;
            for (double b = 0.0; b <= 2.0; b += 0.25)
            {
                var sky = geometry with { Bias = Enumerable.Repeat(b, geometry.Count).ToArray() };
                Assert.True(sky.Evaluate(solver, out AraimResult result));
                Assert.True(result.VplMeters >= previousV - tol, $"VPL fell at b_nom {b}");
                Assert.True(result.HplMeters >= previousH - tol, $"HPL fell at b_nom {b}");
                firstV = b == 0.0 ? result.VplMeters : firstV;
                previousV = result.VplMeters;
                previousH = result.HplMeters;
            }

            // b_U⁽⁰⁾ ≥ b·max|S_U,i| > 0, so 2 m of bias must show clearly.
            Assert.True(previousV > firstV + 1.0, "the bias must raise the VPL");
        }
    }

    [Fact]
    public void Adding_a_satellite_never_increases_the_fault_free_vertical_sigma()
    {
        // Derived: GᵀWG gains a positive semi-definite term, so (GᵀWG)⁻¹ cannot grow (Loewner order).
        var p = new AraimParameters { PSat = 0, PConst = 0 };
        var rng = new System.Random(305);
        var solver = new AraimSolver(14, p);
        for (int trial = 0; trial < 100; trial++)
        {
            int m = rng.Next(5, 13);
            Vec3[] los = GeometryFixtures.RandomSky(rng, m + 1);
            var smaller = AraimFixtures.Build(los[..m], new int[m], p, 0.75);
            var larger = AraimFixtures.Build(los, new int[m + 1], p, 0.75);
            Assert.True(smaller.Evaluate(solver, out _));
            double before = solver.FaultFreeSigmaMeters(2);
            Assert.True(larger.Evaluate(solver, out _));
            Assert.True(solver.FaultFreeSigmaMeters(2) <= before * (1 + 1e-12), $"trial {trial}: sigma_U rose from {before} to {solver.FaultFreeSigmaMeters(2)}");
        }
    }
}

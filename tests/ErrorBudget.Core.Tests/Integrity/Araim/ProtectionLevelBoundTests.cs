using ErrorBudget.Core.Integrity.Araim;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// The MHSS left side is the fault-free term plus non-negative fault terms, so its root is never below the
/// fault-free protection level PL_ff,q = b_q⁽⁰⁾ + Q⁻¹(target_q/2)·σ_q⁽⁰⁾ with the same allocation (derived from
/// the PL equation of REFERENCE-VALUES §5); the search returns the upper end of its bracket, so neither can
/// the result be.
/// </summary>
public class ProtectionLevelBoundTests
{
    /// <summary>Rounding slack only: the inequality is exact.</summary>
    private const double Slack = 1e-9;

    [Fact]
    public void Mhss_protection_levels_are_never_below_the_fault_free_levels_over_200_random_skies()
    {
        // P_const = 1e-8 (the GPS value of §5, from memory) keeps skies with a small constellation usable.
        var p = new AraimParameters { PConst = 1e-8 };
        var rng = new System.Random(200);
        var solver = new AraimSolver(12, p);
        int compared = 0, strictlyAbove = 0;
        for (int trial = 0; trial < 200; trial++)
        {
            var sky = AraimFixtures.RandomSky(rng, rng.Next(6, 13), p);
            if (!sky.Evaluate(solver, out AraimResult result))
            {
                continue;
            }

            double share = 1.0 - (result.UnmonitoredPrior / (p.PhmiVertical + p.PhmiHorizontal));
            if (!(share > 0))
            {
                Assert.Equal(double.PositiveInfinity, result.VplMeters);
                continue;
            }

            double vff = FaultFree(solver, 2, p.PhmiVertical * share);
            double eff = FaultFree(solver, 0, 0.5 * p.PhmiHorizontal * share);
            double nff = FaultFree(solver, 1, 0.5 * p.PhmiHorizontal * share);
            double hff = Math.Sqrt((eff * eff) + (nff * nff));
            Assert.True(result.VplMeters >= vff - Slack, $"trial {trial}: VPL {result.VplMeters} < fault-free {vff}");
            Assert.True(result.HplMeters >= hff - Slack, $"trial {trial}: HPL {result.HplMeters} < fault-free {hff}");
            compared++;
            strictlyAbove += result.VplMeters > vff + p.TolPlMeters ? 1 : 0;
        }

        Assert.True(compared >= 150, $"only {compared} of 200 skies compared");
        Assert.True(strictlyAbove >= compared / 2, "the fault modes should usually raise the VPL"); // guards against dropped fault terms
    }

    private static double FaultFree(AraimSolver solver, int axis, double target) =>
        solver.FaultFreeBiasMeters(axis) - (MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, target / 2) * solver.FaultFreeSigmaMeters(axis));
}

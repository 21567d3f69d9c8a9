using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Tests.Geometry;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>The all-in-view and subset solutions are PositionSolution's WLS with W = C_int⁻¹ (REFERENCE-VALUES §5 "Solutions").</summary>
public class AllInViewSolutionTests
{
    private static readonly AraimParameters Baseline = new();

    [Fact]
    public void All_in_view_projection_equals_the_weighted_least_squares_solution_for_the_same_weights()
    {
        var rng = new System.Random(61);
        var solver = new AraimSolver(14, Baseline);
        for (int trial = 0; trial < 20; trial++)
        {
            var sky = AraimFixtures.TwoConstellations(rng, 5 + (trial % 3), Baseline);
            Assert.True(sky.Evaluate(solver, out _));
            var (ok, projection, _, _) = GeometryFixtures.Solve(sky.LineOfSight, [.. sky.IntegrityVariance.Select(v => 1.0 / v)]);
            Assert.True(ok);
            Assert.Equal(projection, solver.AllInViewProjection.ToArray()); // same weights, same code path: bit-identical
        }
    }

    [Fact]
    public void Subset_projection_is_the_solution_without_the_removed_satellites()
    {
        // Derived: a zero weight is the same as dropping the satellite (Geometry WeightedLeastSquaresTests).
        const double Tolerance = 1e-12;
        var sky = AraimFixtures.TwoConstellations(new System.Random(62), 6, Baseline);
        var solver = new AraimSolver(14, Baseline);
        Assert.True(sky.Evaluate(solver, out _));
        int m = sky.Count;
        for (int k = 0; k < solver.ModeCount; k++)
        {
            int[] keep = [.. Enumerable.Range(0, m).Where(i => !solver.Removes(k, i))];
            var (ok, projection, _, _) = GeometryFixtures.Solve(
                [.. keep.Select(i => sky.LineOfSight[i])], [.. keep.Select(i => 1.0 / sky.IntegrityVariance[i])]);
            Assert.True(ok);
            ReadOnlySpan<double> s = solver.ModeProjection(k);
            for (int q = 0; q < 4; q++)
            {
                for (int i = 0; i < m; i++)
                {
                    int c = Array.IndexOf(keep, i);
                    double expected = c < 0 ? 0.0 : projection[(q * keep.Length) + c];
                    Assert.Equal(expected, s[(q * m) + i], Tolerance);
                }
            }
        }
    }

    [Fact]
    public void Fault_free_sigma_is_the_square_root_of_the_wls_covariance_diagonal()
    {
        // σ_q⁽⁰⁾² = e_qᵀ S C_int Sᵀ e_q = [(GᵀWG)⁻¹]_qq when W = C_int⁻¹ (REFERENCE-VALUES §4 "WLS").
        const double RelativeTolerance = 1e-12;
        var sky = AraimFixtures.RandomSky(new System.Random(63), 10, Baseline);
        var solver = new AraimSolver(14, Baseline);
        Assert.True(sky.Evaluate(solver, out _));
        var covariance = new double[16];
        var projection = new double[40];
        Assert.True(PositionSolution.TrySolve(sky.LineOfSight, [.. sky.IntegrityVariance.Select(v => 1.0 / v)], projection, covariance, out _));
        for (int q = 0; q < 3; q++)
        {
            double expected = Math.Sqrt(covariance[(q * 4) + q]);
            Assert.Equal(expected, solver.FaultFreeSigmaMeters(q), RelativeTolerance * expected);
        }
    }
}

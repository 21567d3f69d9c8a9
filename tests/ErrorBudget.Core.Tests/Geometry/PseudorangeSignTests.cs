using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Tests.Geometry;

/// <summary>
/// The sign convention checked against the physics rather than against S itself: an iterated nonlinear
/// pseudorange fit (ρᵢ = |rᵢ − x| + c·δt) driven by errors ε converges to x̂ − x = S ε (standard
/// linearisation; derived).
/// </summary>
public class PseudorangeSignTests
{
    [Fact]
    public void Projected_range_errors_equal_the_error_of_a_nonlinear_pseudorange_fit()
    {
        // Linearisation error of the fit is about |dx|²/R · GDOP ≈ (10 m)² / 2e7 m × 3 ≈ 2e-5 m (derived);
        // a wrong sign would be off by metres.
        const double LinearisationTolerance = 1e-4;
        const double rangeMeters = 2.0e7;
        const double clockMeters = 50.0;
        var rng = new System.Random(2024);
        int m = 8;
        Vec3[] los = GeometryFixtures.RandomSky(rng, m);
        double[] weights = GeometryFixtures.RandomWeights(rng, m);
        Vec3[] satellites = los.Select(u => rangeMeters * u).ToArray();   // true user at the origin
        double[] eps = Enumerable.Range(0, m).Select(_ => 3.0 * ((2 * rng.NextDouble()) - 1)).ToArray();
        double[] measured = Enumerable.Range(0, m).Select(i => rangeMeters + clockMeters + eps[i]).ToArray();

        var position = Vec3.Zero;
        double clock = 0.0;
        var lineOfSight = new Vec3[m];
        var residual = new double[m];
        var projection = new double[4 * m];
        var covariance = new double[16];
        for (int iteration = 0; iteration < 8; iteration++)
        {
            for (int i = 0; i < m; i++)
            {
                Vec3 d = satellites[i] - position;
                lineOfSight[i] = d.Unit;
                residual[i] = measured[i] - (d.Norm + clock);
            }

            Assert.True(PositionSolution.TrySolve(lineOfSight, weights, projection, covariance, out _));
            position += new Vec3(Row(projection, 0, residual), Row(projection, 1, residual), Row(projection, 2, residual));
            clock += Row(projection, 3, residual);
        }

        Assert.True(PositionSolution.TrySolve(los, weights, projection, covariance, out _));
        // The errors must move the solution by far more than the tolerance, or the check could not fail.
        Assert.True(position.Norm > 0.5, $"position error {position.Norm} m is too small to test the sign");
        Assert.Equal(Row(projection, 0, eps), position.X, LinearisationTolerance);
        Assert.Equal(Row(projection, 1, eps), position.Y, LinearisationTolerance);
        Assert.Equal(Row(projection, 2, eps), position.Z, LinearisationTolerance);
        Assert.Equal(Row(projection, 3, eps), clock - clockMeters, LinearisationTolerance);
    }

    private static double Row(double[] projection, int q, double[] v)
    {
        int m = v.Length;
        double s = 0.0;
        for (int i = 0; i < m; i++)
        {
            s += projection[(q * m) + i] * v[i];
        }

        return s;
    }
}

using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Tests.Geometry;

/// <summary>The hot-path solver must not allocate (design rule: no allocation per sample).</summary>
public class AllocationTests
{
    [Fact]
    public void TrySolve_ProjectCovariance_and_TryCholesky3_do_not_allocate_after_warm_up()
    {
        var rng = new System.Random(3);
        const int m = 10;
        var los = GeometryFixtures.RandomSky(rng, m);
        var weights = GeometryFixtures.RandomWeights(rng, m);
        var variances = weights.Select(w => 1.0 / w).ToArray();
        var projection = new double[4 * m];
        var covariance = new double[16];
        var enu = new double[9];
        var lower = new double[9];

        bool ok = true;
        for (int i = 0; i < 2000; i++)
        {
            ok &= Run(los, weights, variances, projection, covariance, enu, lower);
        }

        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int i = 0; i < 1000; i++)
        {
            ok &= Run(los, weights, variances, projection, covariance, enu, lower);
        }

        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.True(ok);
        Assert.Equal(0L, allocated);
    }

    private static bool Run(
        Vec3[] los, double[] weights, double[] variances, double[] projection, double[] covariance, double[] enu, double[] lower)
    {
        bool ok = PositionSolution.TrySolve(los, weights, projection, covariance, out Dop dop);
        PositionSolution.ProjectCovariance(projection, weights.Length, variances, enu);
        return ok && dop.Gdop > 0 && PositionSolution.TryCholesky3(enu, lower);
    }
}

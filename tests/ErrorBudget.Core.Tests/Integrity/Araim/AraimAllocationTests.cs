using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>TryEvaluate and Test run in the hot loop: no allocation after warm-up (design rule).</summary>
public class AraimAllocationTests
{
    [Fact]
    public void TryEvaluate_and_Test_do_not_allocate_after_warm_up()
    {
        var p = new AraimParameters();
        var sky = AraimFixtures.TwoConstellations(new System.Random(91), 6, p);
        var solver = new AraimSolver(16, p);
        var error = new double[sky.Count];
        var position = new double[3];
        ulong key = CounterRng.Key(5, RandomPurpose.UserLocal, 0, 0, 0);

        int detections = Run(solver, sky, key, error, position, 200);
        long before = GC.GetAllocatedBytesForCurrentThread();
        detections += Run(solver, sky, key, error, position, 200);
        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;

        Assert.Equal(0L, allocated);
        Assert.True(detections > 0); // the faulted samples went through detection and exclusion too
    }

    private static int Run(AraimSolver solver, AraimSky sky, ulong key, double[] error, double[] position, int count)
    {
        int detections = 0;
        for (int s = 0; s < count; s++)
        {
            if (!sky.Evaluate(solver, out AraimResult result) || !(result.VplMeters > 0))
            {
                return -1;
            }

            CounterRng.FillNormals(key, (ulong)(s * error.Length), error);
            error[s % error.Length] += (s & 1) == 0 ? 40.0 : 0.0; // every other sample faulted
            detections += solver.Test(error, position).Detected ? 1 : 0;
        }

        return detections;
    }
}

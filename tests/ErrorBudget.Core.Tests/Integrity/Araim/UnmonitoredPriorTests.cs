using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Tests.Geometry;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// Modes that cannot be monitored add their prior to P_not_monitored, and an epoch with P_not_monitored &gt; P_THRES
/// is flagged unavailable (REFERENCE-VALUES §5; ADD v3.0, from memory).
/// </summary>
public class UnmonitoredPriorTests
{
    private static readonly AraimParameters Baseline = new();

    [Fact]
    public void A_single_constellation_cannot_monitor_its_own_constellation_fault()
    {
        // Removing the only constellation leaves no satellite: P_const = 1e-4 joins P_nm, far above P_THRES = 8e-8,
        // and exceeds PHMI_VERT + PHMI_HOR, so no integrity budget is left and the PLs are infinite.
        var sky = AraimFixtures.RandomSky(new System.Random(71), 9, Baseline) with { Constellation = new int[9] };
        var solver = new AraimSolver(12, Baseline);
        Assert.True(sky.Evaluate(solver, out AraimResult result));

        Assert.Equal(9, result.FaultModes);
        Assert.Equal(1, result.UnmonitorableModes);
        double multiple = ReferenceMhss.TwoOrMore([.. Enumerable.Repeat(Baseline.PSat, 9), Baseline.PConst]);
        Assert.Equal(Baseline.PConst + multiple, result.UnmonitoredPrior, 1e-12 * Baseline.PConst);
        Assert.False(result.UnmonitoredWithinThreshold);
        Assert.Equal(double.PositiveInfinity, result.VplMeters);
        Assert.Equal(double.PositiveInfinity, result.HplMeters);
        Assert.False(Lpv200Criteria.IsAvailable(result));
    }

    [Fact]
    public void Four_satellites_leave_every_single_satellite_mode_unmonitored()
    {
        var p = new AraimParameters { PConst = 0.0 };
        var sky = AraimFixtures.Build(GeometryFixtures.FromAzEl((0, 90), (0, 20), (120, 35), (240, 50)), new int[4], p, 0.75);
        var solver = new AraimSolver(8, p);
        Assert.True(sky.Evaluate(solver, out AraimResult result));
        Assert.Equal(0, result.FaultModes);
        Assert.Equal(4, result.UnmonitorableModes);
        Assert.Equal((4 * p.PSat) + ReferenceMhss.TwoOrMore([.. Enumerable.Repeat(p.PSat, 4)]), result.UnmonitoredPrior, 1e-15);
        Assert.False(result.UnmonitoredWithinThreshold);
    }

    [Fact]
    public void A_subset_with_a_degenerate_geometry_is_unmonitorable()
    {
        // Zenith plus four satellites at one elevation: without the zenith satellite the up and clock columns
        // of G are collinear, so that one subset cannot be solved; the other four can.
        var p = new AraimParameters { PConst = 0.0 };
        var sky = AraimFixtures.Build(GeometryFixtures.FromAzEl((0, 90), (0, 30), (90, 30), (180, 30), (270, 30)), new int[5], p, 0.75);
        var solver = new AraimSolver(8, p);
        Assert.True(sky.Evaluate(solver, out AraimResult result));
        Assert.Equal(4, result.FaultModes);
        Assert.Equal(1, result.UnmonitorableModes);
        Assert.All(Enumerable.Range(0, 4), k => Assert.False(solver.Removes(k, 0)));
        Assert.Equal(p.PSat + ReferenceMhss.TwoOrMore([.. Enumerable.Repeat(p.PSat, 5)]), result.UnmonitoredPrior, 1e-15);
    }

    [Fact]
    public void Two_well_filled_constellations_keep_the_unmonitored_prior_below_the_threshold()
    {
        var sky = AraimFixtures.TwoConstellations(new System.Random(72), 7, Baseline);
        var solver = new AraimSolver(16, Baseline);
        Assert.True(sky.Evaluate(solver, out AraimResult result));
        Assert.Equal(0, result.UnmonitorableModes);
        Assert.True(result.UnmonitoredWithinThreshold, $"P_nm = {result.UnmonitoredPrior}");
        Assert.True(double.IsFinite(result.VplMeters) && double.IsFinite(result.HplMeters));
    }
}

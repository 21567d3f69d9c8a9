using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Relativity;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Core.Tests.Relativity;

/// <summary>
/// Issue 4's must-show: a missed frequency offset that is identical on every satellite (same rate, same
/// accumulation time) moves only the receiver clock, while two orbit radii with the same mistake move the position.
/// Derived from S G = I (PositionSolution): the clock column of G is all ones, so S 1 = e_4.
/// </summary>
public class RelativityCommonModeTests
{
    /// <summary>Issue 4: "position error unchanged to 1e-6 m" (rounding of kilometre errors is about 1e-12 m).</summary>
    private const double CommonModeToleranceMeters = 1e-6;

    private const string Missed = "frequency_offset = \"missed\"\nground_absorbs = \"none\"";

    private static readonly string OneShell = RelativityScenarios.Shell("single", 27_600);
    private static readonly string TwoShells = RelativityScenarios.Shell("inner", 25_500) + RelativityScenarios.Shell("outer", 29_600);

    /// <summary>Largest |dE|, |dN|, |dU| over the grid users at time t, and the largest |range error|, through PositionSolution.</summary>
    private static (double Position, double Range, double ClockMinusRange) Worst(Scenario scenario, double t)
    {
        var constellation = Constellation.FromShells(scenario.Shells);
        var states = new SatelliteState[constellation.Count];
        constellation.Propagate(t, 0.0, states);
        var clock = new RelativisticClockError(scenario);
        var sampler = new SatelliteErrorSampler(scenario, scenario.Run.Seed);
        double sinMask = Math.Sin(scenario.Grid.MaskDeg * Math.PI / 180);
        double worstPosition = 0, worstRange = 0, worstClock = 0;
        foreach (GridCell cell in ServiceGrid.From(scenario.Grid).Cells)
        {
            var los = new List<Vec3>();
            var eps = new List<double>();
            for (int s = 0; s < states.Length; s++)
            {
                Vec3 d = states[s].PositionEcef - cell.Frame.Origin;
                Vec3 enu = cell.Frame.ToEnu(d / d.Norm);
                if (enu.Z < sinMask)
                {
                    continue;
                }

                sampler.AgeOfData(s, t, out _, out double age);
                los.Add(enu);
                eps.Add(clock.ClockRangeErrorMeters(s, age, t, states[s].EccentricAnomalyRad));
            }

            int m = los.Count;
            var projection = new double[4 * m];
            // Elevation-dependent weights, as a receiver would use: the property must not depend on equal weights.
            double[] weights = [.. los.Select(u => u.Z * u.Z)];
            if (!PositionSolution.TrySolve([.. los], weights, projection, new double[16], out _))
            {
                continue;
            }

            for (int q = 0; q < 4; q++)
            {
                double dx = 0;
                for (int i = 0; i < m; i++)
                {
                    dx += projection[q * m + i] * eps[i];
                }

                if (q < 3)
                {
                    worstPosition = Math.Max(worstPosition, Math.Abs(dx));
                }
                else
                {
                    worstClock = Math.Max(worstClock, Math.Abs(dx - eps[0]));
                }
            }

            worstRange = Math.Max(worstRange, eps.Max(Math.Abs));
        }

        return (worstPosition, worstRange, worstClock);
    }

    [Fact]
    public void Identical_missed_rate_on_every_satellite_moves_only_the_receiver_clock()
    {
        var scenario = RelativityScenarios.Load(OneShell, Missed);
        var early = Worst(scenario, 1800);
        var late = Worst(scenario, 19_800);

        Assert.InRange(early.Position, 0, CommonModeToleranceMeters);
        Assert.InRange(late.Position, 0, CommonModeToleranceMeters);
        Assert.InRange(late.ClockMinusRange, 0, CommonModeToleranceMeters); // the receiver clock takes it all
        // Range error -c y t with y = Net(27,600 km) = 4.56e-10: 246 m at 0.5 h, 2.7 km at 5.5 h.
        Assert.True(early.Range > 200, $"range error at 0.5 h: {early.Range} m");
        Assert.True(late.Range > 10 * early.Range, $"range error must grow: {early.Range} -> {late.Range} m");
    }

    [Fact]
    public void Two_orbit_radii_with_the_same_mistake_grow_a_position_error()
    {
        // Net(25,500 km) - Net(29,600 km) = 3.6e-11: the shells' clocks part at c x 3.6e-11 = 1.1 cm/s, 39 m/h.
        var scenario = RelativityScenarios.Load(TwoShells, Missed);
        var early = Worst(scenario, 1800);
        var late = Worst(scenario, 19_800);

        Assert.True(early.Position > 1, $"position error at 0.5 h: {early.Position} m");
        Assert.True(late.Position > 5 * early.Position, $"position error must grow: {early.Position} -> {late.Position} m");
    }

    [Fact]
    public void Staggered_uploads_make_a_single_shell_mistake_differ_per_satellite()
    {
        // ground_absorbs = "offset": each clock restarts at its own upload, so ages (and errors) differ: not common mode.
        // This is why the common-mode demonstration uses ground_absorbs = "none".
        var scenario = RelativityScenarios.Load(OneShell, "frequency_offset = \"missed\"");

        Assert.True(Worst(scenario, 19_800).Position > 100);
    }

    [Fact]
    public async Task End_to_end_a_common_mistake_leaves_every_position_percentile_unchanged()
    {
        // Identical seeds and every other error source at its default: HPE and VPE percentiles per cell and over the
        // service area must agree to 1e-6 m with and without the missed offset, while the range errors reach kilometres.
        var options = new RunOptions { Threads = 2 };
        var applied = await MonteCarloEngine.RunAsync(RelativityScenarios.Load(OneShell, "", quiet: false, trials: 16), options, CancellationToken.None);
        var missed = await MonteCarloEngine.RunAsync(RelativityScenarios.Load(OneShell, Missed, quiet: false, trials: 16), options, CancellationToken.None);

        Assert.Equal(applied.Cells.Count, missed.Cells.Count);
        for (int c = 0; c < applied.Cells.Count; c++)
        {
            AssertSame(applied.Cells[c].Hpe, missed.Cells[c].Hpe);
            AssertSame(applied.Cells[c].Vpe, missed.Cells[c].Vpe);
        }

        AssertSame(applied.Global.Vpe, missed.Global.Vpe);
        Assert.True(missed.Relativity.Satellites.Max(s => s.FrequencyOffset.MaxAbs) > 1000);
        Assert.InRange(missed.Relativity.Position.Hpe.MaxAbs, 0, CommonModeToleranceMeters);
        Assert.InRange(missed.Relativity.Position.Vpe.MaxAbs, 0, CommonModeToleranceMeters);
    }

    [Fact]
    public async Task End_to_end_two_shells_with_the_same_mistake_multiply_the_vertical_error()
    {
        var options = new RunOptions { Threads = 2 };
        var applied = await MonteCarloEngine.RunAsync(RelativityScenarios.Load(TwoShells, "", quiet: false, trials: 16), options, CancellationToken.None);
        var missed = await MonteCarloEngine.RunAsync(RelativityScenarios.Load(TwoShells, Missed, quiet: false, trials: 16), options, CancellationToken.None);

        // Defaults give VPE p95 of a few metres; 5.5 h at 39 m/h of differential clock is about 200 m of range.
        Assert.True(missed.Global.Vpe.P95 > 10 * applied.Global.Vpe.P95, $"VPE p95 {applied.Global.Vpe.P95} -> {missed.Global.Vpe.P95} m");
        Assert.True(missed.Relativity.Position.Vpe.MaxAbs > 10, $"relativity-only VPE max {missed.Relativity.Position.Vpe.MaxAbs} m");
    }

    private static void AssertSame(PercentileSet expected, PercentileSet actual)
    {
        foreach (var (e, a) in new[] { (expected.P50, actual.P50), (expected.P95, actual.P95), (expected.P99, actual.P99), (expected.P999, actual.P999) })
        {
            if (double.IsNaN(e))
            {
                Assert.True(double.IsNaN(a));
                continue;
            }

            Assert.Equal(e, a, CommonModeToleranceMeters);
        }
    }
}

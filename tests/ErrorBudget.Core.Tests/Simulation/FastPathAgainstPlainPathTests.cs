using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Tests.Simulation;

/// <summary>
/// Issue 6: the engine's fast path (single precision, user-level errors entered through the Cholesky
/// factor of S Sigma S^T, three normals per trial, sketch percentiles) against a plain path written
/// here: every visible satellite's range error in double precision, satellite-level errors from the
/// same sampler plus its own user-level draw sigma_i z_i, x = S eps, and exact sample quantiles of the
/// sorted errors. Both must give the same per-cell percentiles within the Monte Carlo tolerance.
/// </summary>
public sealed class FastPathAgainstPlainPathTests
{
    private const string Scenario = """
        [run]
        seed = 5
        trials = 20000
        duration_h = 1
        step_s = 1800

        [[shell]]
        name = "plain"
        satellites = 24
        planes = 4
        phasing = 1
        inclination_deg = 56
        semi_major_axis_km = 29600

        [grid]
        lat_step_deg = 45
        lon_step_deg = 60
        mask_deg = 5

        [clock]
        upload_sigma_m = 0.8

        [orbit]
        radial_sigma_m = 0.4
        along_sigma_m = 1.5
        cross_sigma_m = 0.9

        [user]
        ionosphere = "single-frequency"
        iono_vertical_sigma_m = 1.5
        tropo_zenith_sigma_m = 0.12
        multipath = "airborne"
        noise_sigma_m = 0.3
        """;

    [Fact]
    public async Task Per_cell_percentiles_agree_with_a_plain_double_precision_per_satellite_path()
    {
        var scenario = ScenarioLoader.Load(Scenario, "plain.toml");
        RunResult fast = await MonteCarloEngine.RunAsync(scenario, new RunOptions { Threads = 2 }, CancellationToken.None);

        var setup = new SimulationSetup(scenario, new RunOptions { TrialBlock = 20000 }); // one block: every trial in one stride
        var kernel = new TileKernel(setup, [], useSimd: true);
        var sampler = new SatelliteErrorSampler(scenario, setup.Seed);
        int trials = setup.Trials;
        int stride = setup.LaneCapacity;
        var hpe = new List<double>[setup.Grid.Count];
        var vpe = new List<double>[setup.Grid.Count];
        for (int c = 0; c < hpe.Length; c++)
        {
            hpe[c] = [];
            vpe[c] = [];
        }

        var scratch = new TileScratch(scenario.TotalSatellites, stride, SimulationSetup.SketchAccuracy);
        var local = new double[trials];
        for (int e = 0; e < setup.Epochs; e++)
        {
            var work = new EpochWork(scenario.TotalSatellites, stride);
            double t = scenario.Run.EpochTimeSeconds(e);
            work.Epoch = e;
            work.BlockTrials = trials;
            work.RotationAngleRad = setup.StartRotationAngleRad + (Core.Geodesy.Wgs84.EarthRotationRateRadPerSecond * t);
            setup.Constellation.Propagate(t, setup.StartRotationAngleRad, work.States);
            work.FillPositions();
            sampler.Sample(e, t, work.RotationAngleRad, work.States, 0, trials, stride, work.SatelliteErrors);
            foreach (var cell in setup.Grid.Cells)
            {
                if (!kernel.TrySolveGeometry(work, cell, scratch, out int m, out _))
                {
                    continue;
                }

                var x = new double[3 * trials];
                for (int i = 0; i < m; i++)
                {
                    int sat = scratch.Visible[i];
                    var u = scratch.LineOfSight[i];
                    double sigma = Math.Sqrt(scratch.TruthVariance[i]);
                    // The plain path's own user-level draws (a purpose the engine never uses).
                    CounterRng.FillNormals(CounterRng.Key(77, RandomPurpose.Spare, e, cell.Index, sat), 0, local);
                    for (int j = 0; j < trials; j++)
                    {
                        double range = work.SatelliteErrors[SatelliteErrorSampler.IndexOf(sat, 3, j, stride)]
                            + (u.X * work.SatelliteErrors[SatelliteErrorSampler.IndexOf(sat, 0, j, stride)])
                            + (u.Y * work.SatelliteErrors[SatelliteErrorSampler.IndexOf(sat, 1, j, stride)])
                            + (u.Z * work.SatelliteErrors[SatelliteErrorSampler.IndexOf(sat, 2, j, stride)])
                            + (sigma * local[j]);
                        for (int q = 0; q < 3; q++)
                        {
                            x[(q * trials) + j] += scratch.Projection[(q * m) + i] * range;
                        }
                    }
                }

                for (int j = 0; j < trials; j++)
                {
                    hpe[cell.Index].Add(Math.Sqrt((x[j] * x[j]) + (x[trials + j] * x[trials + j])));
                    vpe[cell.Index].Add(Math.Abs(x[(2 * trials) + j]));
                }
            }
        }

        int compared = 0;
        foreach (var row in fast.Cells)
        {
            double[] h = [.. hpe[row.CellIndex].Order()];
            double[] v = [.. vpe[row.CellIndex].Order()];
            Assert.Equal(h.Length, row.Samples);
            if (h.Length == 0)
            {
                continue;
            }

            foreach (var (q, fastH, fastV) in new[] { (0.50, row.Hpe.P50, row.Vpe.P50), (0.95, row.Hpe.P95, row.Vpe.P95), (0.99, row.Hpe.P99, row.Vpe.P99) })
            {
                Assert.InRange(fastH, ExactQuantile.Of(h, q) - Tolerance(h, q), ExactQuantile.Of(h, q) + Tolerance(h, q));
                Assert.InRange(fastV, ExactQuantile.Of(v, q) - Tolerance(v, q), ExactQuantile.Of(v, q) + Tolerance(v, q));
                compared++;
            }
        }

        Assert.True(compared >= 3 * 20, $"only {compared} comparisons");
    }

    /// <summary>
    /// 4.5 standard errors of the difference of two independent sample q-quantiles of n values,
    /// sd = sqrt(q (1 - q) / n) / f(x_q) each (asymptotic normality of order statistics), with the
    /// density estimated from the plain sample's spacing f = 2 d / (x_(q+d) - x_(q-d)), d = 0.005;
    /// plus the sketch's relative accuracy alpha and 1e-5 relative for single precision.
    /// </summary>
    private static double Tolerance(double[] sorted, double q)
    {
        const double d = 0.005;
        int n = sorted.Length;
        double density = 2 * d / (ExactQuantile.Of(sorted, Math.Min(1, q + d)) - ExactQuantile.Of(sorted, q - d));
        double sd = Math.Sqrt(q * (1 - q) / n) / density;
        double x = ExactQuantile.Of(sorted, q);
        return (4.5 * Math.Sqrt(2) * sd) + ((SimulationSetup.SketchAccuracy + 1e-5) * x);
    }
}

using System.Globalization;
using System.Runtime.CompilerServices;
using ErrorBudget.Core;
using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Cli.Reports;

/// <summary>What a scenario implies, printed by `errorbudget check`.</summary>
internal static class CheckReport
{
    /// <summary>
    /// Throughput used for the time estimate, user-solutions per second per thread: a conservative
    /// figure below what `errorbudget bench` measured on the reference machine (20-24 M/s on one thread
    /// for W1 on 2026-12-02, see README; runs with [integrity] tallies are slower).
    /// </summary>
    public const double SolutionsPerSecondPerThread = 12e6;

    /// <summary>How much slower a run with ARAIM protection levels is per user-solution (integrity-faults.toml vs integrity-demo.toml).</summary>
    public const double AraimSlowdown = 25.0;

    /// <summary>Visibility is sampled on at most this many user-epochs, so check stays quick.</summary>
    private const int VisibilitySampleBudget = 200_000;

    public static async Task WriteAsync(TextWriter w, Scenario s, int threads, CancellationToken ct)
    {
        var c = CultureInfo.InvariantCulture;
        var constellation = Constellation.FromShells(s.Shells);
        await w.WriteLineAsync($"scenario {s.SourceName}: valid").ConfigureAwait(false);
        await w.WriteLineAsync(string.Create(c, $"constellation: {constellation.Count} satellites in {s.Shells.Count} shell(s)")).ConfigureAwait(false);
        foreach (var shell in s.Shells)
        {
            double a = shell.SemiMajorAxisMeters;
            double e = shell.Eccentricity;
            double gm = Wgs84.GravitationalParameter;
            double period = Kepler.Period(a, gm);
            double vPerigee = Math.Sqrt(gm * (1 + e) / (a * (1 - e)));
            double vApogee = Math.Sqrt(gm * (1 - e) / (a * (1 + e)));
            string speed = e == 0
                ? string.Create(c, $"{vPerigee / 1000:0.000} km/s ({vPerigee * 3.6:N0} km/h)")
                : string.Create(c, $"{vApogee / 1000:0.000} .. {vPerigee / 1000:0.000} km/s");
            await w.WriteLineAsync(string.Create(c,
                $"  {shell.Name}: Walker {shell.Satellites}/{shell.Planes}/{shell.Phasing}, i {shell.InclinationDeg:0.###} deg, a {a / 1000:0.###} km (altitude {(a - Wgs84.SemiMajorAxisMeters) / 1000:N0} km), e {e:0.####}, period {period / 3600:0.000} h, speed {speed}")).ConfigureAwait(false);
        }

        var grid = ServiceGrid.From(s.Grid);
        int epochs = s.Run.Epochs;
        long solutions = (long)grid.Count * epochs * s.Run.Trials;
        await w.WriteLineAsync(string.Create(c, $"grid: {grid.Rows} x {grid.Columns} = {grid.Count} users, lat {s.Grid.LatMinDeg}..{s.Grid.LatMaxDeg} deg, lon {s.Grid.LonMinDeg}..{s.Grid.LonMaxDeg} deg, mask {s.Grid.MaskDeg} deg")).ConfigureAwait(false);
        await w.WriteLineAsync(string.Create(c, $"time: {epochs} epochs of {s.Run.StepSeconds} s from {s.Run.StartUtc:yyyy-MM-ddTHH:mm:ssZ}")).ConfigureAwait(false);

        var (min, mean, max, under4) = Visibility(s, constellation, grid, ct);
        await w.WriteLineAsync(string.Create(c, $"satellites in view (sampled): min {min}, mean {mean:0.0}, max {max}; user-epochs with fewer than 4: {under4 * 100:0.##} %")).ConfigureAwait(false);
        await w.WriteLineAsync(string.Create(c, $"samples: {grid.Count} users x {epochs} epochs x {s.Run.Trials} trials = {solutions:N0} user-solutions")).ConfigureAwait(false);
        // ARAIM draws every satellite's range per trial and runs the monitor: measured about 20-25x slower per solution than W1.
        double perThread = s.Integrity?.Method == ProtectionLevelMethod.Araim ? SolutionsPerSecondPerThread / AraimSlowdown : SolutionsPerSecondPerThread;
        double seconds = solutions / (perThread * Math.Max(1, threads));
        await w.WriteLineAsync(string.Create(c, $"estimate: about {FormatSeconds(seconds)} on {threads} threads, about {EstimateMemoryMiB(s, grid.Count, threads):N0} MiB of memory")).ConfigureAwait(false);
        await IntegrityLines(w, s).ConfigureAwait(false); // issue 5
        await RelativityCheckReport.WriteAsync(w, s, ct).ConfigureAwait(false); // issue 4
        await ClockReport.WriteAsync(w, s).ConfigureAwait(false);
        await w.WriteLineAsync($"caution: {Caution.Text}").ConfigureAwait(false);
    }

    private static (int Min, double Mean, int Max, double Under4) Visibility(Scenario s, Constellation constellation, ServiceGrid grid, CancellationToken ct)
    {
        int epochs = s.Run.Epochs;
        long total = (long)epochs * grid.Count;
        int epochStride = (int)Math.Max(1, total / VisibilitySampleBudget / Math.Max(1, grid.Count));
        var states = new SatelliteState[constellation.Count];
        double angle0 = EarthRotation.EarthRotationAngle(s.Run.StartUtc);
        double sinMask = Math.Sin(s.Grid.MaskDeg * Math.PI / 180);
        int min = int.MaxValue, max = 0;
        long sum = 0, count = 0, under4 = 0;
        for (int e = 0; e < epochs; e += epochStride)
        {
            ct.ThrowIfCancellationRequested();
            constellation.Propagate(s.Run.EpochTimeSeconds(e), angle0, states);
            foreach (var cell in grid.Cells)
            {
                int m = 0;
                foreach (var st in states)
                {
                    Vec3 d = st.PositionEcef - cell.Frame.Origin;
                    if (cell.Frame.ToEnu(d / d.Norm).Z >= sinMask)
                    {
                        m++;
                    }
                }

                min = Math.Min(min, m);
                max = Math.Max(max, m);
                sum += m;
                count++;
                under4 += m < 4 ? 1 : 0;
            }
        }

        return (min, (double)sum / count, max, (double)under4 / count);
    }

    /// <summary>
    /// Cell accumulators (two error sketches of ~600 buckets and three DOP sketches of ~200, 8 bytes
    /// each, with up to 3x growth slack: about 40 kB a cell, calibrated on W1 with `errorbudget bench`),
    /// in-flight epoch buffers, and the runtime itself (~70 MiB).
    /// </summary>
    private static double EstimateMemoryMiB(Scenario s, int cells, int threads)
    {
        double perCell = 40_000;
        int block = Math.Min(s.Run.Trials, 2048);
        double perEpoch = s.TotalSatellites * block * 4 * 8.0;
        double scratch = threads * (3.0 * block * 8 + 3 * 400 * 8);
        double clocks = s.Clock.IsGraded ? s.TotalSatellites * block * (Unsafe.SizeOf<ClockState>() + 8.0) : 0; // one clock state per satellite and trial of a block
        return (cells * perCell + (2 * threads + 4 + 3 * Core.Simulation.SimulationSetup.EpochsPerBatch) * perEpoch + scratch + clocks) / 1048576.0 + 70;
    }

    private static async Task IntegrityLines(TextWriter w, Scenario s)
    {
        var c = CultureInfo.InvariantCulture;
        if (s.Integrity is not { } i)
        {
            await w.WriteLineAsync("integrity: none (add an [integrity] table for protection levels and availability)").ConfigureAwait(false);
            return;
        }

        string val = i.HasVertical ? string.Create(c, $"{i.VerticalAlertLimitMeters} m") : "none";
        string method = i.Method == ProtectionLevelMethod.Araim
            ? string.Create(c, $"ARAIM (sigma_URA {i.Araim.UraSigmaMeters} m, sigma_URE {i.Araim.UreSigmaMeters:0.###} m, b_nom {i.Araim.NominalBiasMeters} m, P_sat {i.Araim.SatelliteFaultPrior}, P_const {i.Araim.ConstellationFaultPrior})")
            : string.Create(c, $"DO-229 weighted (K_H {i.KHorizontal}, K_V {i.KVertical})");
        await w.WriteLineAsync(string.Create(c, $"integrity: {i.Service}, HAL {i.HorizontalAlertLimitMeters} m, VAL {val}, {method}; availability target {i.AvailabilityTarget}")).ConfigureAwait(false);
        if (s.Faults is { IsActive: true } f)
        {
            await w.WriteLineAsync(string.Create(c, $"faults: per satellite per hour clock steps {f.ClockStepRatePerHour}, ramps {f.ClockRampRatePerHour}, orbit {f.OrbitRatePerHour}; per shell {f.ConstellationRatePerHour}; each lasting {f.DurationSeconds / 3600} h")).ConfigureAwait(false);
        }
    }

    private static string FormatSeconds(double seconds) => seconds < 90
        ? string.Create(CultureInfo.InvariantCulture, $"{Math.Max(1, seconds):0} s")
        : string.Create(CultureInfo.InvariantCulture, $"{seconds / 60:0.0} min");
}

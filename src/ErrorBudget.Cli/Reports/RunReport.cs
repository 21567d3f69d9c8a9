using System.Globalization;
using ErrorBudget.Core;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Cli.Reports;

/// <summary>The short text report printed after a run (stdout).</summary>
internal static class RunReport
{
    public static async Task WriteAsync(TextWriter w, RunResult r, string folder)
    {
        var g = r.Global;
        var s = r.Scenario;
        var c = CultureInfo.InvariantCulture;
        await w.WriteLineAsync(string.Create(c, $"scenario   {s.SourceName} (sha256 {r.Metadata.ScenarioHash[..12]}), seed {r.Metadata.Seed}, {r.Metadata.Trials} trials")).ConfigureAwait(false);
        await w.WriteLineAsync(r.Exact
            ? string.Create(c, $"exact      {r.Cells.Count} cells x {r.Epochs.Count} epochs: percentiles of the Gaussian position-error mixtures (no sampling) in {r.Metadata.RunSeconds:0.0} s on {r.Metadata.Threads} threads")
            : string.Create(c, $"simulated  {r.Cells.Count} cells x {r.Epochs.Count} epochs x {r.Metadata.Trials} trials = {g.Samples:N0} position samples in {r.Metadata.RunSeconds:0.0} s on {r.Metadata.Threads} threads")).ConfigureAwait(false);
        await w.WriteLineAsync(string.Create(c, $"unavailable {g.UnavailableFraction * 100:0.###} % of the area-weighted user-epochs (fewer than 4 satellites)")).ConfigureAwait(false);
        await w.WriteLineAsync("service area (area-weighted, pooled)   p50       p95       p99       p99.9").ConfigureAwait(false);
        await w.WriteLineAsync(Row("  HPE (m)", g.Hpe)).ConfigureAwait(false);
        await w.WriteLineAsync(Row("  VPE (m)", g.Vpe)).ConfigureAwait(false);
        if (r.Intervals is { } ci)
        {
            await w.WriteLineAsync(string.Create(c, $"  95 % batch-means interval of p95 ({ci.Batches} trial batches): HPE {F(ci.Hpe[1].Lower)} to {F(ci.Hpe[1].Upper)} m, VPE {F(ci.Vpe[1].Lower)} to {F(ci.Vpe[1].Upper)} m")).ConfigureAwait(false);
        }

        await w.WriteLineAsync(Worst("worst cell by HPE p95", g.WorstHpe)).ConfigureAwait(false);
        await w.WriteLineAsync(Worst("worst cell by VPE p95", g.WorstVpe)).ConfigureAwait(false);
        if (r.Integrity is { } integrity)
        {
            await IntegrityLines(w, integrity).ConfigureAwait(false);
        }

        await w.WriteLineAsync($"result set {folder}").ConfigureAwait(false);
        await w.WriteLineAsync($"caution    {Caution.Text}").ConfigureAwait(false);
    }

    private static async Task IntegrityLines(TextWriter w, IntegrityReport i)
    {
        var c = CultureInfo.InvariantCulture;
        var g = i.Global;
        string val = double.IsNaN(i.VerticalAlertLimitMeters) ? "none" : F(i.VerticalAlertLimitMeters) + " m";
        await w.WriteLineAsync(string.Create(c, $"integrity  {i.Service}, HAL {F(i.HorizontalAlertLimitMeters)} m, VAL {val}, {i.Method} protection levels")).ConfigureAwait(false);
        await w.WriteLineAsync(string.Create(c, $"  availability {g.Availability * 100:0.##} % (area-weighted), coverage {g.Coverage * 100:0.##} % of the area at >= {i.AvailabilityTarget * 100:0.###} %")).ConfigureAwait(false);
        if (!double.IsNaN(g.AccuracyAreaShare))
        {
            await w.WriteLineAsync(string.Create(c, $"  accuracy: {g.AccuracyAreaShare * 100:0.##} % of the area meets HPE p95 <= {F(g.HorizontalAccuracy95Meters)} m and VPE p95 <= {(double.IsNaN(g.VerticalAccuracy95Meters) ? "-" : F(g.VerticalAccuracy95Meters))} m")).ConfigureAwait(false);
        }

        await w.WriteLineAsync(Rate("  misleading information    H", g.MisleadingHorizontal) + Rate("   V", g.MisleadingVertical)).ConfigureAwait(false);
        await w.WriteLineAsync(Rate("  hazardously misleading    H", g.HazardousHorizontal) + Rate("   V", g.HazardousVertical)).ConfigureAwait(false);
        if (i.Method == "araim")
        {
            await w.WriteLineAsync(string.Create(c, $"  monitor: {g.Detections.Events:N0} detections, {g.Exclusions:N0} exclusions, {g.MissedDetections.Events:N0} missed of {g.FaultedSamples:N0} faulted samples")).ConfigureAwait(false);
        }

        string overbound = double.IsNaN(g.WorstRequiredInflation)
            ? "no bin had enough samples for a verdict"
            : string.Create(c, $"worst required inflation {F(g.WorstRequiredInflation)} ({g.WorstOverboundGroup})");
        await w.WriteLineAsync($"  overbounding: {overbound}; see overbound.parquet").ConfigureAwait(false);
        await w.WriteLineAsync("  (analysis for design and safety studies, not a certified integrity monitor: the applicable standards and authorities decide)").ConfigureAwait(false);
    }

    private static string Rate(string label, EventRate r) => string.Create(
        CultureInfo.InvariantCulture, $"{label} {r.Events:N0} ({(double.IsNaN(r.Rate) ? "-" : r.Rate.ToString("0.###E+0", CultureInfo.InvariantCulture))}, <= {(double.IsNaN(r.Upper) ? "-" : r.Upper.ToString("0.###E+0", CultureInfo.InvariantCulture))} at 95 %)");

    private static string Row(string label, PercentileSet p) => string.Create(
        CultureInfo.InvariantCulture,
        $"{label,-39}{F(p.P50),-10}{F(p.P95),-10}{F(p.P99),-10}{F(p.P999)}");

    private static string Worst(string label, WorstCell w) => w.CellIndex < 0
        ? $"{label}: none (no cell had samples)"
        : string.Create(CultureInfo.InvariantCulture, $"{label}: {w.P95Meters:0.###} m at lat {w.LatDeg:0.##}, lon {w.LonDeg:0.##} (cell {w.CellIndex})");

    private static string F(double v) => double.IsNaN(v) ? "-" : v.ToString("0.###", CultureInfo.InvariantCulture);
}

using System.Globalization;
using ErrorBudget.Core.Relativity;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Cli.Reports;

/// <summary>The relativity lines of `errorbudget check`: the figures of relativity.parquet, per shell, and the position error of the missed terms.</summary>
internal static class RelativityCheckReport
{
    private const double E10 = 1e10;

    public static async Task WriteAsync(TextWriter w, Scenario s, CancellationToken ct)
    {
        var c = CultureInfo.InvariantCulture;
        RelativitySpec spec = s.Relativity;
        var report = RelativityAnalysis.Build(s, ct);
        await w.WriteLineAsync(string.Create(c,
            $"relativity: frequency_offset {Mode(spec.FrequencyOffset)} (factor {spec.FrequencyOffsetFactor}), eccentricity_term {Mode(spec.EccentricityTerm)} (factor {spec.EccentricityFactor}), sagnac {Mode(spec.Sagnac)}, shapiro {Mode(spec.Shapiro)}, ground absorbs {Ground(spec.GroundAbsorbs)}")).ConfigureAwait(false);
        foreach (var group in report.Satellites.GroupBy(r => r.ShellName))
        {
            var first = group.First();
            ErrorStatistics frequency = Pool(group, r => r.FrequencyOffset);
            ErrorStatistics periodic = Pool(group, r => r.EccentricityTerm);
            ErrorStatistics sagnac = Pool(group, r => r.Sagnac);
            ErrorStatistics shapiro = Pool(group, r => r.Shapiro);
            double amplitude = first.PeriodicAmplitudeSeconds;
            await w.WriteLineAsync(string.Create(c,
                $"  {group.Key}: offsets SR {first.VelocityOffset * E10:+0.0000;-0.0000} GR {first.GravitationalOffset * E10:+0.0000;-0.0000} net {first.NetOffset * E10:+0.0000;-0.0000} x 1e-10 = {SecularRate.MicrosecondsPerDay(first.VelocityOffset):+0.000;-0.000} / {SecularRate.MicrosecondsPerDay(first.GravitationalOffset):+0.000;-0.000} / {SecularRate.MicrosecondsPerDay(first.NetOffset):+0.000;-0.000} us/day, range drift {SecularRate.RangeMetersPerDay(first.NetOffset):N0} m/day; periodic term {amplitude * 1e9:0.00} ns ({amplitude * Core.Geodesy.PhysicalConstants.SpeedOfLight:0.00} m)")).ConfigureAwait(false);
            await w.WriteLineAsync(string.Create(c,
                $"    applied {first.AppliedOffset * E10:+0.0000;-0.0000;0} x 1e-10, residual {first.ResidualOffset * E10:+0.0000;-0.0000;0} x 1e-10 ({SecularRate.RangeMetersPerDay(first.ResidualOffset):N1} m/day); range error rms/max: frequency offset {Figure(frequency)}, eccentricity term {Figure(periodic)}, sagnac {Figure(sagnac)}, shapiro {Figure(shapiro)}")).ConfigureAwait(false);
        }

        var p = report.Position;
        await w.WriteLineAsync(string.Create(c,
            $"  position error of the missed terms alone ({p.UserEpochs:N0} user-epochs, {report.SampledEpochs} epochs sampled): HPE {Figure(p.Hpe)}, VPE {Figure(p.Vpe)}, receiver clock {Figure(p.ReceiverClock)}")).ConfigureAwait(false);
    }

    private static ErrorStatistics Pool(IEnumerable<RelativitySatelliteFigures> rows, Func<RelativitySatelliteFigures, ErrorStatistics> get)
    {
        var pooled = default(ErrorStatistics);
        foreach (var r in rows)
        {
            pooled.Merge(get(r));
        }

        return pooled;
    }

    /// <summary>"rms / max m" with a precision that suits metres to kilometres; "-" when there are no samples.</summary>
    private static string Figure(ErrorStatistics e) => e.Count == 0
        ? "-"
        : string.Create(CultureInfo.InvariantCulture, $"{Number(e.Rms)} / {Number(e.MaxAbs)} m");

    private static string Number(double v) => v switch
    {
        0 => "0",
        < 1e-6 => v.ToString("0.0e+0", CultureInfo.InvariantCulture),
        < 1 => v.ToString("0.000", CultureInfo.InvariantCulture),
        _ => v.ToString("N1", CultureInfo.InvariantCulture),
    };

    private static string Mode(FrequencyOffsetMode m) => m switch
    {
        FrequencyOffsetMode.Missed => "missed",
        FrequencyOffsetMode.Preset => "preset",
        _ => "applied",
    };

    private static string Mode(RelativityTermMode m) => m == RelativityTermMode.Missed ? "missed" : "applied";

    private static string Ground(GroundAbsorption g) => g switch
    {
        GroundAbsorption.Rate => "rate",
        GroundAbsorption.None => "none",
        _ => "offset",
    };
}

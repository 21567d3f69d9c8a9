using System.Globalization;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Cli.Reports;

/// <summary>The [clock] part of `errorbudget check`: the grade's Allan deviation and the range error one upload interval after an upload.</summary>
internal static class ClockReport
{
    /// <summary>Averaging times printed: 1 s, 100 s, 1e4 s and one day.</summary>
    public static readonly double[] TausSeconds = [1, 100, 1e4, 86_400];

    public static async Task WriteAsync(TextWriter w, Scenario s)
    {
        var c = CultureInfo.InvariantCulture;
        var clock = s.Clock;
        var intervals = s.Shells.Select(sh => sh.UploadIntervalSeconds ?? clock.UploadIntervalSeconds).Distinct().Order().ToArray();
        string jitter = clock.UploadJitterSeconds > 0
            ? string.Create(c, $", upload jitter {clock.UploadJitterSeconds:0.###} s ({clock.JitterDistribution.ToString().ToLowerInvariant()})")
            : "";
        if (clock.Noise is not { } n)
        {
            await w.WriteLineAsync(string.Create(c,
                $"clock: simple model, upload error {clock.UploadSigmaMeters:0.###} m, growth {clock.GrowthSigmaMetersPerSecond * 3600:0.###} m/h{jitter}")).ConfigureAwait(false);
            foreach (double interval in intervals)
            {
                double sigma = Math.Sqrt(GradedClockModel.RangeMeanSquare(clock, interval, s.Run.StepSeconds));
                await w.WriteLineAsync(string.Create(c, $"  range error after one upload interval ({Hours(interval)}): {sigma:0.000} m (1 sigma)")).ConfigureAwait(false);
            }

            return;
        }

        double step = s.Run.StepSeconds;
        double fh = GradedClockModel.HighCutoffHz(step);
        await w.WriteLineAsync(string.Create(c,
            $"clock: grade {clock.Grade}, h2 {n.H2:G3}, h0 {n.H0:G3}, h-1 {n.HMinus1:G3}, h-2 {n.HMinus2:G3}, drift {n.DriftPerSecond * 86_400:G3}/day{jitter}")).ConfigureAwait(false);
        if (clock.AdevFitRelativeRms is { } rms)
        {
            await w.WriteLineAsync(string.Create(c,
                $"  fitted to {clock.AdevPoints!.Count} Allan deviation points: rms relative residual {rms * 100:0.0} %")).ConfigureAwait(false);
        }

        string adev = string.Join(", ", TausSeconds.Select(t => string.Create(c, $"{TauText(t)} {n.AllanDeviation(t, fh):0.00E+0}")));
        await w.WriteLineAsync(string.Create(c, $"  sigma_y (f_h = 1/(2 x {step:0.###} s)): {adev}")).ConfigureAwait(false);
        double light = PhysicalConstants.SpeedOfLight;
        foreach (double interval in intervals)
        {
            double total = light * Math.Sqrt(GradedClockModel.PhaseErrorVariance(clock, interval, step));
            double estimation = light * Math.Sqrt(GradedClockModel.PhaseErrorVariance(clock with { Noise = default(Core.Clocks.PowerLawCoefficients) }, interval, step));
            double drift = light * GradedClockModel.DriftPhaseSeconds(clock, interval);
            string bias = drift != 0 ? string.Create(c, $"; drift adds a bias of {-drift:G3} m") : "";
            await w.WriteLineAsync(string.Create(c,
                $"  predicted range error after one upload interval ({Hours(interval)}): {total:0.000} m (1 sigma; estimation error alone {estimation:0.000} m){bias}")).ConfigureAwait(false);
        }
    }

    private static string Hours(double seconds) => string.Create(CultureInfo.InvariantCulture, $"{seconds / 3600:0.###} h");

    private static string TauText(double tau) => tau switch
    {
        86_400 => "1 day",
        >= 1e4 => string.Create(CultureInfo.InvariantCulture, $"{tau:0E+0} s"),
        _ => string.Create(CultureInfo.InvariantCulture, $"{tau:0} s"),
    };
}

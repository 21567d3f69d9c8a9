using ErrorBudget.Core.Random;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// When each satellite's broadcast clock is uploaded, and so the age of data of every satellite at any time.
/// Upload k of satellite s happens at t = phase_s + k I_s + j_(s,k): I_s the interval of the satellite's shell
/// (<see cref="ShellSpec.UploadIntervalSeconds"/>, else [clock]), phase_s = I_s s / N with s the satellite's index in the
/// constellation and N its size (so with one interval the phases spread evenly over the constellation: common practice
/// for a ground segment that contacts satellites in turn), and j_(s,k) the jitter. k is any integer (negative before
/// t = 0). Age of data at t is t minus the time of the latest upload at or before t.
/// </summary>
/// <remarks>
/// Jitter: standard deviation J = <see cref="ClockSpec.UploadJitterSeconds"/>, uniform on [-sqrt(3) J, sqrt(3) J] or
/// normal clamped to +-4 J, drawn from the counter-based stream (seed, <see cref="RandomPurpose.SatelliteClock"/>,
/// -1, k, s): one draw per satellite and upload, the same in every trial (a schedule, not a trial-level error; the
/// trial-level streams use trial &gt;= 0). The scenario rule J &lt;= I/10 keeps |j| &lt; 0.4 I, so uploads never swap order.
/// </remarks>
public sealed class UploadSchedule
{
    /// <summary>The trial word of the jitter streams: below every real trial index.</summary>
    public const long JitterTrialWord = -1;

    private const double GaussianClampSigmas = 4.0;

    private readonly double[] _interval;
    private readonly double[] _phase;
    private readonly ulong _seed;
    private readonly double _jitterSigma;
    private readonly UploadJitterDistribution _distribution;

    public UploadSchedule(Scenario scenario, ulong seed)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        int n = scenario.TotalSatellites;
        _interval = new double[n];
        _phase = new double[n];
        int s = 0;
        foreach (var shell in scenario.Shells)
        {
            double interval = shell.UploadIntervalSeconds ?? scenario.Clock.UploadIntervalSeconds;
            for (int i = 0; i < shell.Satellites; i++, s++)
            {
                _interval[s] = interval;
                _phase[s] = interval * s / n;
            }
        }

        _seed = seed;
        _jitterSigma = scenario.Clock.UploadJitterSeconds;
        _distribution = scenario.Clock.JitterDistribution;
        JitterBoundSeconds = _jitterSigma * (_distribution == UploadJitterDistribution.Uniform ? Math.Sqrt(3.0) : GaussianClampSigmas);
        MaxIntervalSeconds = n == 0 ? scenario.Clock.UploadIntervalSeconds : _interval.Max();
    }

    /// <summary>Satellites in the schedule.</summary>
    public int Satellites => _interval.Length;

    /// <summary>Largest |jitter| any upload can have (s).</summary>
    public double JitterBoundSeconds { get; }

    /// <summary>Longest upload interval in use (s).</summary>
    public double MaxIntervalSeconds { get; }

    /// <summary>Largest age of data any satellite can reach (s): the longest interval plus twice the jitter bound.</summary>
    public double MaxAgeSeconds => MaxIntervalSeconds + 2.0 * JitterBoundSeconds;

    /// <summary>Upload interval of satellite <paramref name="satellite"/> (s).</summary>
    public double IntervalSeconds(int satellite) => _interval[satellite];

    /// <summary>Jitter of upload <paramref name="upload"/> of satellite <paramref name="satellite"/> (s); 0 without jitter.</summary>
    public double JitterSeconds(int satellite, long upload)
    {
        if (_jitterSigma == 0)
        {
            return 0.0;
        }

        ulong key = CounterRng.Key(_seed, RandomPurpose.SatelliteClock, JitterTrialWord, upload, satellite);
        return _distribution == UploadJitterDistribution.Uniform
            ? (2.0 * CounterRng.Uniform(key, 0) - 1.0) * JitterBoundSeconds
            : Math.Clamp(_jitterSigma * CounterRng.Normal(key, 0), -JitterBoundSeconds, JitterBoundSeconds);
    }

    /// <summary>Time of upload <paramref name="upload"/> of satellite <paramref name="satellite"/>, seconds from the start.</summary>
    public double UploadTimeSeconds(int satellite, long upload) =>
        _phase[satellite] + upload * _interval[satellite] + JitterSeconds(satellite, upload);

    /// <summary>The latest upload at or before <paramref name="timeSeconds"/> and the age of data then (s, &gt;= 0).</summary>
    public void AgeOfData(int satellite, double timeSeconds, out long uploadIndex, out double ageSeconds)
    {
        double interval = _interval[satellite];
        double phase = _phase[satellite];
        double k = Math.Floor((timeSeconds - phase) / interval);
        if (_jitterSigma == 0)
        {
            uploadIndex = (long)k;
            ageSeconds = timeSeconds - phase - k * interval;
            return;
        }

        // |jitter| < interval / 2: the latest upload is the nominal one, the next (early) or the previous (late).
        long nominal = (long)k;
        for (long candidate = nominal + 1; candidate >= nominal - 1; candidate--)
        {
            double at = UploadTimeSeconds(satellite, candidate);
            if (at <= timeSeconds || candidate == nominal - 1)
            {
                uploadIndex = candidate;
                ageSeconds = Math.Max(0.0, timeSeconds - at);
                return;
            }
        }

        throw new InvalidOperationException("unreachable");
    }
}

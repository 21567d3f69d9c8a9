using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Relativity;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// Draws the satellite-level truth errors of one epoch for a block of trials. They are common to
/// every user who sees the satellite at that epoch in that trial, which is what correlates the
/// errors of neighbouring users.
/// <para>
/// Layout of the output (one epoch, one block of <c>blockTrials</c> trials), component-major so
/// the kernel reads consecutive trials with vector loads: <see cref="IndexOf"/> =
/// <c>(sat * 4 + k) * blockTrials + t</c>, k = 0, 1, 2 the orbit error vector in ECEF metres (true
/// minus broadcast satellite position), k = 3 the clock range error in metres.
/// </para>
/// <para>
/// Sign convention (owned here): the pseudorange error of satellite s seen along the unit line of
/// sight u (user to satellite, ECEF) is eps = u . dr + clockRange + user terms, where
/// clockRange = -c (dt_true - dt_broadcast): a satellite clock that runs ahead of its broadcast
/// model makes the signal look early, so the range looks short.
/// </para>
/// </summary>
public sealed class SatelliteErrorSampler
{
    /// <summary>Values per (satellite, trial): orbit x, y, z and clock.</summary>
    public const int Components = 4;

    /// <summary>Position of (satellite, component, trial within the block) in the error buffer.</summary>
    public static int IndexOf(int satellite, int component, int trial, int stride) =>
        (satellite * Components + component) * stride + trial;

    private readonly ClockSpec _clock;
    private readonly OrbitErrorSpec _orbit;
    private readonly ulong _seed;
    private readonly int _satellites;
    private readonly RelativisticClockError _relativity;

    public SatelliteErrorSampler(Scenario scenario, ulong seed)
    {
        _clock = scenario.Clock;
        _orbit = scenario.Orbit;
        _seed = seed;
        _satellites = scenario.TotalSatellites;
        _relativity = new RelativisticClockError(scenario);
    }

    /// <summary>
    /// Upload schedule: uploads of satellite s happen at phase_s + k * interval with the phases
    /// staggered evenly across the constellation, so ages of data at any instant spread over one
    /// interval (common practice for a ground segment that contacts satellites in turn).
    /// </summary>
    public void AgeOfData(int satellite, double timeSeconds, out long uploadIndex, out double ageSeconds)
    {
        double interval = _clock.UploadIntervalSeconds;
        double phase = interval * satellite / _satellites;
        double k = Math.Floor((timeSeconds - phase) / interval);
        uploadIndex = (long)k;
        ageSeconds = timeSeconds - phase - k * interval;
    }

    /// <summary>
    /// Fills <paramref name="errors"/> for trials [firstTrial, firstTrial + blockTrials), laid out with
    /// <paramref name="stride"/> (>= blockTrials: the kernel pads blocks to whole vectors).
    /// </summary>
    public void Sample(
        int epoch,
        double timeSeconds,
        double rotationAngleRad,
        ReadOnlySpan<SatelliteState> states,
        int firstTrial,
        int blockTrials,
        int stride,
        Span<double> errors)
    {
        Span<double> z = stackalloc double[3];
        for (int s = 0; s < _satellites; s++)
        {
            ref readonly SatelliteState st = ref states[s];
            var (radial, along, cross) = OrbitFrame.RadialAlongCross(st.PositionInertial, st.VelocityInertial);
            Vec3 r = EarthRotation.InertialToEarthFixed(radial, rotationAngleRad);
            Vec3 a = EarthRotation.InertialToEarthFixed(along, rotationAngleRad);
            Vec3 c = EarthRotation.InertialToEarthFixed(cross, rotationAngleRad);
            AgeOfData(s, timeSeconds, out long upload, out double age);

            for (int j = 0; j < blockTrials; j++)
            {
                int trial = firstTrial + j;
                ulong orbitKey = CounterRng.Key(_seed, RandomPurpose.SatelliteOrbit, trial, epoch, s);
                CounterRng.FillNormalsScalar(orbitKey, 0, z);
                double dr = _orbit.RadialSigmaMeters * z[0];
                double da = _orbit.AlongSigmaMeters * z[1];
                double dc = _orbit.CrossSigmaMeters * z[2];

                ulong clockKey = CounterRng.Key(_seed, RandomPurpose.SatelliteClock, trial, upload, s);
                double offset = _clock.UploadSigmaMeters * CounterRng.Normal(clockKey, 0);
                double rate = _clock.GrowthSigmaMetersPerSecond * CounterRng.Normal(clockKey, 1);

                errors[IndexOf(s, 0, j, stride)] = dr * r.X + da * a.X + dc * c.X;
                errors[IndexOf(s, 1, j, stride)] = dr * r.Y + da * a.Y + dc * c.Y;
                errors[IndexOf(s, 2, j, stride)] = dr * r.Z + da * a.Z + dc * c.Z;
                errors[IndexOf(s, 3, j, stride)] = offset + rate * age;
            }

            // Relativity (issue 4): what [relativity] leaves in the clock, the same in every trial.
            if (_relativity.IsActive)
            {
                double relativity = _relativity.ClockRangeErrorMeters(s, age, timeSeconds, st.EccentricAnomalyRad);
                for (int j = 0; j < blockTrials; j++)
                {
                    errors[IndexOf(s, 3, j, stride)] += relativity;
                }
            }
        }
    }
}

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
/// model makes the signal look early, so the range looks short. The graded clock model writes
/// -c x with x the simulated phase error (truth minus broadcast, <see cref="Clocks.ClockState"/>).
/// </para>
/// <para>
/// Clock models: the simple one (no grade) draws offset + rate * age per upload; a graded one runs a
/// power-law noise clock per (trial, satellite) from t = 0 (<see cref="SatelliteClockBank"/>), so the
/// sampler must see the epochs of a block in order (it replays from epoch 0 otherwise). Age of data
/// comes from the <see cref="Schedule"/>. Each call also adds its samples to the age-of-data
/// statistics (<see cref="AgeOfDataRows"/>).
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
    private readonly RunSettings _run;
    private readonly ulong _seed;
    private readonly int _satellites;
    private readonly RelativisticClockError _relativity;
    private readonly SatelliteClockBank? _clocks;
    private readonly AgeOfDataAccumulator _ageOfData;
    private readonly FaultInjector? _faults;
    private ulong[] _orbitKeyStates = [];   // per trial of the block: key state after (seed, orbit, trial, epoch)
    private ulong[] _clockKeyStates = [];   // per trial of the block: key state after (seed, clock, trial)
    private ulong[] _keys = [];             // per trial: one satellite's finished keys
    private double[] _orbitNormals = [];    // [k * lanes + j]: orbit normal k (radial, along, cross) of trial j
    private double[] _clockNormals = [];    // [k * lanes + j]: clock normal k (offset, rate) of trial j

    public SatelliteErrorSampler(Scenario scenario, ulong seed)
    {
        _clock = scenario.Clock;
        _orbit = scenario.Orbit;
        _run = scenario.Run;
        _seed = seed;
        _satellites = scenario.TotalSatellites;
        _relativity = new RelativisticClockError(scenario);
        Schedule = new UploadSchedule(scenario, seed);
        _clocks = _clock.IsGraded ? new SatelliteClockBank(scenario, Schedule, seed) : null;
        _ageOfData = new AgeOfDataAccumulator(Schedule.MaxAgeSeconds);
        _faults = scenario.Faults is { IsActive: true } f ? new FaultInjector(f, scenario.Shells, seed) : null;
    }

    /// <summary>
    /// Upload schedule: uploads of satellite s happen at phase_s + k * interval (+ jitter) with the
    /// phases staggered evenly across the constellation, so ages of data at any instant spread over
    /// one interval (common practice for a ground segment that contacts satellites in turn).
    /// </summary>
    public UploadSchedule Schedule { get; }

    /// <summary>The latest upload of a satellite at a time and the age of data then (s); see <see cref="UploadSchedule"/>.</summary>
    public void AgeOfData(int satellite, double timeSeconds, out long uploadIndex, out double ageSeconds) =>
        Schedule.AgeOfData(satellite, timeSeconds, out uploadIndex, out ageSeconds);

    /// <summary>Age of data (s) of <paramref name="satellite"/> at epoch <paramref name="epoch"/> of the run.</summary>
    public double AgeOfDataSeconds(int satellite, int epoch)
    {
        Schedule.AgeOfData(satellite, _run.EpochTimeSeconds(epoch), out _, out double age);
        return age;
    }

    /// <summary>
    /// Clock and orbit range error statistics by age of data over every sample drawn so far
    /// (<see cref="AgeOfDataAccumulator.Bins"/> equal bins over [0, <see cref="UploadSchedule.MaxAgeSeconds"/>]).
    /// </summary>
    public IReadOnlyList<AgeOfDataRow> AgeOfDataRows() => _ageOfData.Rows();

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
        Span<double> errors) => Sample(epoch, timeSeconds, rotationAngleRad, states, firstTrial, blockTrials, stride, errors, []);

    /// <summary>
    /// As above; with [faults], also adds the injected faults and marks faulted (satellite, trial)
    /// pairs in <paramref name="faulted"/> at [satellite * stride + trial] (cleared first; may be empty
    /// when the caller does not need the marks).
    /// </summary>
    public void Sample(
        int epoch,
        double timeSeconds,
        double rotationAngleRad,
        ReadOnlySpan<SatelliteState> states,
        int firstTrial,
        int blockTrials,
        int stride,
        Span<double> errors,
        Span<bool> faulted)
    {
        faulted.Clear();
        _clocks?.AdvanceTo(epoch, firstTrial, blockTrials);
        const double lightSpeed = PhysicalConstants.SpeedOfLight;
        // Key states after (seed, purpose, trial), once per trial of the block: each (satellite, trial)
        // then finishes its keys with one or two absorptions instead of five (same keys, bit for bit),
        // four trials at a time, and draws its normals in the same vectors (LaneNormals). The padded
        // lanes past the block are computed and not used.
        int lanes = (blockTrials + LaneNormals.Lanes - 1) / LaneNormals.Lanes * LaneNormals.Lanes;
        if (_orbitKeyStates.Length < lanes)
        {
            _orbitKeyStates = new ulong[lanes]; // once per run: blocks never grow
            _clockKeyStates = new ulong[lanes];
            _keys = new ulong[lanes];
            _orbitNormals = new double[3 * lanes];
            _clockNormals = new double[2 * lanes];
        }

        Span<ulong> orbitStates = _orbitKeyStates.AsSpan(0, lanes);
        Span<ulong> clockStates = _clockKeyStates.AsSpan(0, lanes);
        Span<ulong> keys = _keys.AsSpan(0, lanes);
        ulong orbitStart = CounterRng.KeyStart(_seed, RandomPurpose.SatelliteOrbit);
        ulong clockStart = CounterRng.KeyStart(_seed, RandomPurpose.SatelliteClock);
        for (int j = 0; j < lanes; j++)
        {
            orbitStates[j] = CounterRng.KeyWithB(CounterRng.KeyWithA(orbitStart, firstTrial + j), epoch);
            clockStates[j] = CounterRng.KeyWithA(clockStart, firstTrial + j);
        }

        for (int s = 0; s < _satellites; s++)
        {
            ref readonly SatelliteState st = ref states[s];
            var (radial, along, cross) = OrbitFrame.RadialAlongCross(st.PositionInertial, st.VelocityInertial);
            Vec3 r = EarthRotation.InertialToEarthFixed(radial, rotationAngleRad);
            Vec3 a = EarthRotation.InertialToEarthFixed(along, rotationAngleRad);
            Vec3 c = EarthRotation.InertialToEarthFixed(cross, rotationAngleRad);
            AgeOfData(s, timeSeconds, out long upload, out double age);
            int bin = _ageOfData.BinOf(age);
            _ageOfData.AddEpoch(bin, age, GradedClockModel.RangeMeanSquare(_clock, age, _run.StepSeconds), blockTrials);

            // Orbit normals 0..2 of Key(seed, orbit, trial, epoch, s); clock normals 0, 1 (one
            // Box-Muller pair) of Key(seed, clock, trial, upload, s).
            LaneNormals.FinishKeys(orbitStates, CounterRng.WordC(s), keys);
            LaneNormals.FillHeads(keys, 3, _orbitNormals, lanes);
            if (_clocks is null)
            {
                LaneNormals.FinishKeys(clockStates, CounterRng.WordB(upload), keys);
                LaneNormals.FinishKeys(keys, CounterRng.WordC(s), keys);
                LaneNormals.FillHeads(keys, 2, _clockNormals, lanes);
            }

            for (int j = 0; j < blockTrials; j++)
            {
                double dr = _orbit.RadialSigmaMeters * _orbitNormals[j];
                double da = _orbit.AlongSigmaMeters * _orbitNormals[lanes + j];
                double dc = _orbit.CrossSigmaMeters * _orbitNormals[(2 * lanes) + j];

                double clockRange;
                if (_clocks is null)
                {
                    double offset = _clock.UploadSigmaMeters * _clockNormals[j];
                    double rate = _clock.GrowthSigmaMetersPerSecond * _clockNormals[lanes + j];
                    clockRange = offset + rate * age;
                }
                else
                {
                    clockRange = -lightSpeed * _clocks.PhaseSeconds(s, j);
                }

                errors[IndexOf(s, 0, j, stride)] = dr * r.X + da * a.X + dc * c.X;
                errors[IndexOf(s, 1, j, stride)] = dr * r.Y + da * a.Y + dc * c.Y;
                errors[IndexOf(s, 2, j, stride)] = dr * r.Z + da * a.Z + dc * c.Z;
                errors[IndexOf(s, 3, j, stride)] = clockRange;
                _ageOfData.Add(bin, clockRange, AgeOfDataAccumulator.OrbitUre(dr, da, dc));
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

            // Faults (issue 5): steps, ramps and orbit faults on top of the nominal errors.
            if (_faults is not null)
            {
                for (int j = 0; j < blockTrials; j++)
                {
                    if (!_faults.Active(firstTrial + j, s, timeSeconds, out double clockFault, out Vec3 orbitFault))
                    {
                        continue;
                    }

                    errors[IndexOf(s, 0, j, stride)] += orbitFault.X * r.X + orbitFault.Y * a.X + orbitFault.Z * c.X;
                    errors[IndexOf(s, 1, j, stride)] += orbitFault.X * r.Y + orbitFault.Y * a.Y + orbitFault.Z * c.Y;
                    errors[IndexOf(s, 2, j, stride)] += orbitFault.X * r.Z + orbitFault.Y * a.Z + orbitFault.Z * c.Z;
                    errors[IndexOf(s, 3, j, stride)] += clockFault;
                    if (!faulted.IsEmpty)
                    {
                        faulted[(s * stride) + j] = true;
                    }
                }
            }
        }
    }
}

using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// The graded satellite clocks of one block of trials: one <see cref="ClockState"/> per (satellite, trial in block),
/// advanced epoch by epoch with a <see cref="ClockSimulator"/> and reset at the uploads of an <see cref="UploadSchedule"/>.
/// </summary>
/// <remarks>
/// <para>Every clock starts at epoch 0 at its age of data then (<see cref="ClockSimulator.InitializeAtAge"/>), so the
/// staggered ages hold from the first epoch. At epoch e &gt; 0 a clock takes one <see cref="ClockSimulator.Step"/>, or
/// <see cref="ClockSimulator.StepWithUpload"/> when its latest upload changed since epoch e - 1 (the newest one counts
/// when several fall in one step).</para>
/// <para>Random streams: the noise of (trial, satellite) at epoch e uses (seed, <see cref="RandomPurpose.ClockNoise"/>,
/// trial, satellite, e), epoch 0 its start-up draws; the estimation error of upload k uses (seed,
/// <see cref="RandomPurpose.SatelliteClock"/>, trial, k, satellite): normal 0 the phase, normal 1 the frequency (the same
/// stream the simple model takes its offset and rate from). So a clock's path depends only on (seed, trial, satellite),
/// never on threads, tiles or blocks. A call that does not continue the previous one (another block, or an epoch
/// out of order) restarts the block at epoch 0 and replays up to the epoch asked for: same numbers, more work.</para>
/// </remarks>
internal sealed class SatelliteClockBank
{
    private readonly ClockSimulator _simulator;
    private readonly UploadSchedule _schedule;
    private readonly ClockSpec _clock;
    private readonly RunSettings _run;
    private readonly ulong _seed;
    private readonly int _satellites;
    private readonly double[] _normals;
    private readonly long[] _lastUpload;
    private ClockState[] _states = [];
    private double[] _phase = [];
    private int _capacity;
    private int _firstTrial = -1;
    private int _blockTrials = -1;
    private int _lastEpoch = -1;

    public SatelliteClockBank(Scenario scenario, UploadSchedule schedule, ulong seed)
    {
        _simulator = GradedClockModel.CreateSimulator(scenario);
        _schedule = schedule;
        _clock = scenario.Clock;
        _run = scenario.Run;
        _seed = seed;
        _satellites = scenario.TotalSatellites;
        _normals = new double[Math.Max(_simulator.NormalsPerStep, _simulator.NormalsPerInitializeAtAge)];
        _lastUpload = new long[_satellites];
    }

    /// <summary>The simulator every clock runs.</summary>
    public ClockSimulator Simulator => _simulator;

    /// <summary>
    /// Brings every clock of trials [firstTrial, firstTrial + blockTrials) to <paramref name="epoch"/>; afterwards
    /// <see cref="PhaseSeconds"/> gives their output phase errors (truth minus broadcast, s).
    /// </summary>
    public void AdvanceTo(int epoch, int firstTrial, int blockTrials)
    {
        bool continues = firstTrial == _firstTrial && blockTrials == _blockTrials && epoch == _lastEpoch + 1;
        if (!continues)
        {
            Allocate(blockTrials);
            _firstTrial = firstTrial;
            _blockTrials = blockTrials;
            for (int e = 0; e < epoch; e++)
            {
                Advance(e);
            }
        }

        Advance(epoch);
        _lastEpoch = epoch;
    }

    /// <summary>Output phase error (s) of (satellite, trial in block) at the last epoch advanced to.</summary>
    public double PhaseSeconds(int satellite, int trialInBlock) => _phase[satellite * _capacity + trialInBlock];

    private void Allocate(int blockTrials)
    {
        if (blockTrials > _capacity)
        {
            _capacity = blockTrials;
            _states = new ClockState[_satellites * _capacity];
            _phase = new double[_satellites * _capacity];
        }
    }

    private void Advance(int epoch)
    {
        double t = _run.EpochTimeSeconds(epoch);
        double dt = _run.StepSeconds;
        for (int s = 0; s < _satellites; s++)
        {
            _schedule.AgeOfData(s, t, out long upload, out double age);
            bool start = epoch == 0;
            bool uploaded = !start && upload != _lastUpload[s];
            _lastUpload[s] = upload;
            int row = s * _capacity;
            for (int j = 0; j < _blockTrials; j++)
            {
                int trial = _firstTrial + j;
                ref ClockState state = ref _states[row + j];
                ulong noiseKey = CounterRng.Key(_seed, RandomPurpose.ClockNoise, trial, s, epoch);
                if (start || uploaded)
                {
                    ulong estimationKey = CounterRng.Key(_seed, RandomPurpose.SatelliteClock, trial, upload, s);
                    double x0 = _clock.EstimationPhaseSigmaSeconds * CounterRng.Normal(estimationKey, 0);
                    double y0 = _clock.EstimationFrequencySigma * CounterRng.Normal(estimationKey, 1);
                    if (start)
                    {
                        var normals = _normals.AsSpan(0, _simulator.NormalsPerInitializeAtAge);
                        CounterRng.FillNormals(noiseKey, 0, normals);
                        _phase[row + j] = _simulator.InitializeAtAge(ref state, x0, y0, age, normals);
                    }
                    else
                    {
                        var normals = _normals.AsSpan(0, _simulator.NormalsPerStepWithUpload);
                        CounterRng.FillNormals(noiseKey, 0, normals);
                        _phase[row + j] = _simulator.StepWithUpload(ref state, x0, y0, Math.Clamp(age, 0.0, dt), normals);
                    }
                }
                else
                {
                    var normals = _normals.AsSpan(0, _simulator.NormalsPerStep);
                    CounterRng.FillNormals(noiseKey, 0, normals);
                    _phase[row + j] = _simulator.Step(ref state, normals);
                }
            }
        }
    }
}

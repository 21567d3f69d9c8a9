using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// Truth faults ([faults]) as a pure function of (seed, trial, satellite, time), so they are the same
/// for any thread count or tile size. Time is cut into windows of one fault duration D; in window w
/// each kind of fault starts with probability 1 - exp(-rate D) at w D + u D and lasts D, so at time t
/// only windows floor(t / D) and the one before can hold an active fault (a Poisson onset process
/// with at most one onset per window and kind, a fair approximation while rate D is small).
/// </summary>
internal sealed class FaultInjector
{
    private const int KindClockStep = 0;
    private const int KindClockRamp = 1;
    private const int KindOrbit = 2;
    private const int KindConstellation = 3;
    private const double SecondsPerHour = 3600.0;

    private readonly FaultSpec _spec;
    private readonly ulong _seed;
    private readonly int[] _shellOf;
    private readonly double[] _onsetProbability = new double[4];

    public FaultInjector(FaultSpec spec, IReadOnlyList<ShellSpec> shells, ulong seed)
    {
        _spec = spec;
        _seed = seed;
        _shellOf = [.. shells.SelectMany((shell, index) => Enumerable.Repeat(index, shell.Satellites))];
        double windowHours = spec.DurationSeconds / SecondsPerHour;
        _onsetProbability[KindClockStep] = -double.ExpM1(-spec.ClockStepRatePerHour * windowHours);
        _onsetProbability[KindClockRamp] = -double.ExpM1(-spec.ClockRampRatePerHour * windowHours);
        _onsetProbability[KindOrbit] = -double.ExpM1(-spec.OrbitRatePerHour * windowHours);
        _onsetProbability[KindConstellation] = -double.ExpM1(-spec.ConstellationRatePerHour * windowHours);
    }

    /// <summary>
    /// The fault part of satellite <paramref name="satellite"/>'s errors in <paramref name="trial"/> at
    /// time <paramref name="timeSeconds"/>: a clock range error (m) and an orbit error in the
    /// radial/along/cross frame (m). Returns false (outputs zero) when no fault is active.
    /// </summary>
    public bool Active(int trial, int satellite, double timeSeconds, out double clockMeters, out Vec3 orbitRac)
    {
        clockMeters = 0;
        orbitRac = default;
        double d = _spec.DurationSeconds;
        long window = (long)Math.Floor(timeSeconds / d);
        bool any = false;
        for (long w = window - 1; w <= window; w++)
        {
            if (w < 0)
            {
                continue;
            }

            any |= Clock(KindClockStep, trial, satellite, w, timeSeconds, ref clockMeters);
            any |= Clock(KindClockRamp, trial, satellite, w, timeSeconds, ref clockMeters);
            any |= Clock(KindConstellation, trial, _shellOf[satellite], w, timeSeconds, ref clockMeters, satellite);
            any |= Orbit(trial, satellite, w, timeSeconds, ref orbitRac);
        }

        return any;
    }

    private bool Clock(int kind, int trial, int entity, long window, double t, ref double clockMeters, int satellite = -1)
    {
        if (!Onset(kind, trial, entity, window, t, out ulong key, out double sinceOnset))
        {
            return false;
        }

        // A constellation-wide fault: one onset per shell, an independent step on each of its satellites.
        if (kind == KindConstellation)
        {
            key = CounterRng.Key(_seed, RandomPurpose.Fault, trial, window, (4L << 32) + satellite);
        }

        double sign = CounterRng.Uniform(key, 2) < 0.5 ? -1.0 : 1.0;
        double u = CounterRng.Uniform(key, 3);
        clockMeters += kind == KindClockRamp
            ? sign * Lerp(_spec.ClockRampMinMetersPerSecond, _spec.ClockRampMaxMetersPerSecond, u) * sinceOnset
            : sign * Lerp(_spec.ClockStepMinMeters, _spec.ClockStepMaxMeters, u);
        return true;
    }

    private bool Orbit(int trial, int satellite, long window, double t, ref Vec3 orbitRac)
    {
        if (!Onset(KindOrbit, trial, satellite, window, t, out ulong key, out _))
        {
            return false;
        }

        // A uniformly random direction (normalised Gaussian vector) times a uniform magnitude.
        Vec3 direction = new(CounterRng.Normal(key, 4), CounterRng.Normal(key, 5), CounterRng.Normal(key, 6));
        double magnitude = Lerp(_spec.OrbitMinMeters, _spec.OrbitMaxMeters, CounterRng.Uniform(key, 3));
        orbitRac += direction * (magnitude / Math.Max(direction.Norm, 1e-300));
        return true;
    }

    private bool Onset(int kind, int trial, int entity, long window, double t, out ulong key, out double sinceOnset)
    {
        sinceOnset = 0;
        key = 0;
        double p = _onsetProbability[kind];
        if (p <= 0)
        {
            return false;
        }

        key = CounterRng.Key(_seed, RandomPurpose.Fault, trial, window, ((long)kind << 32) + entity);
        if (CounterRng.Uniform(key, 0) >= p)
        {
            return false;
        }

        double onset = (window + CounterRng.Uniform(key, 1)) * _spec.DurationSeconds;
        sinceOnset = t - onset;
        return sinceOnset >= 0 && sinceOnset < _spec.DurationSeconds;
    }

    private static double Lerp(double a, double b, double u) => a + ((b - a) * u);
}

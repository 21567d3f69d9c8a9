using System.Globalization;
using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Simulates a clock error epoch by epoch at a fixed step dt from power-law coefficients: the exact two-state model
/// (white FM h0, random-walk FM h-2, drift D), plus flicker FM h-1 as a <see cref="FlickerFrequencyBank"/>, plus white PM
/// h2 added to the output phase. Standard normals come from the caller, so any generator (e.g. counter-based) can
/// drive it. Immutable and shareable; the per-clock state is a <see cref="ClockState"/> value.
/// </summary>
/// <remarks>
/// One step (normals n[0..NormalsPerStep)): with Z = sum_k z_k the flicker frequency at the start of the step,
/// x += (y + Z) dt + D dt^2/2 + L11 n0; y += D dt + L21 n0 + L22 n1 (<see cref="TwoStateClockModel"/>);
/// z_k = phi_k z_k + b_k n[2+k]; output = x + sigma_wpm n[2+K]. The sampled fractional frequency
/// (x_{i+1} - x_i)/dt therefore has PSD h0 + (the bank's ~h-1/f) + RWFM, and the white PM per-sample deviation is
/// sigma_wpm = sqrt(h2 f_h) / (2 pi) with f_h = 1/(2 dt), so sigma_y^2(tau) = 3 f_h h2 / (4 pi^2 tau^2) exactly.
/// The flicker phase uses the pole sum at the start of each step (rectangle rule), so the first step after a reset carries
/// no flicker phase error. Flicker PM (h1) is not simulated: a non-zero h1 is rejected.
/// </remarks>
public sealed partial class ClockSimulator
{
    private readonly TwoStateClockModel _twoState;
    private readonly double[] _phi;
    private readonly double[] _innovationSigma;
    private readonly double[] _stationarySigma;
    private readonly double _whitePmSigma;

    /// <param name="coefficients">Noise coefficients; validated; h1 must be 0.</param>
    /// <param name="stepSeconds">Step dt. Range: &gt; 0 s.</param>
    /// <param name="flickerMaxCorrelationSeconds">T_max of the flicker band (used when h-1 &gt; 0). Range: &gt;= 4 dt.</param>
    /// <param name="polesPerDecade">Flicker pole density, see <see cref="FlickerFrequencyBank"/>.</param>
    public ClockSimulator(
        in PowerLawCoefficients coefficients,
        double stepSeconds,
        double flickerMaxCorrelationSeconds,
        double polesPerDecade = FlickerFrequencyBank.DefaultPolesPerDecade)
    {
        coefficients.EnsureValid();
        if (coefficients.H1 > 0)
        {
            throw new ClockDefinitionException(PowerLawCoefficients.KeyH1, string.Create(CultureInfo.InvariantCulture,
                $"{PowerLawCoefficients.KeyH1}: {coefficients.H1} — flicker PM is not simulated; set h1 = 0 (use white PM h2 for phase noise)."));
        }

        Coefficients = coefficients;
        StepSeconds = stepSeconds;
        _twoState = new TwoStateClockModel(coefficients, stepSeconds);
        Flicker = coefficients.HMinus1 > 0
            ? new FlickerFrequencyBank(coefficients.HMinus1, stepSeconds, flickerMaxCorrelationSeconds, polesPerDecade)
            : null;
        PoleCount = Flicker?.PoleCount ?? 0;
        _phi = new double[PoleCount];
        _innovationSigma = new double[PoleCount];
        _stationarySigma = new double[PoleCount];
        for (int k = 0; k < PoleCount; k++)
        {
            _phi[k] = Flicker!.Phi(k);
            _innovationSigma[k] = Flicker.InnovationSigma(k);
            _stationarySigma[k] = Flicker.StationarySigma(k);
        }

        HasWhitePm = coefficients.H2 > 0;
        _whitePmSigma = Math.Sqrt(coefficients.H2 * (0.5 / stepSeconds)) / (2.0 * Math.PI);
        NormalsPerStep = 2 + PoleCount + (HasWhitePm ? 1 : 0);
    }

    /// <summary>The coefficients simulated.</summary>
    public PowerLawCoefficients Coefficients { get; }

    /// <summary>Step dt (s).</summary>
    public double StepSeconds { get; }

    /// <summary>The flicker bank, or null when h-1 = 0.</summary>
    public FlickerFrequencyBank? Flicker { get; }

    /// <summary>Number of flicker poles in use (0 when h-1 = 0).</summary>
    public int PoleCount { get; }

    /// <summary>True when white PM is added to the output phase.</summary>
    public bool HasWhitePm { get; }

    /// <summary>White PM standard deviation added to each output phase (s).</summary>
    public double WhitePmSigmaSeconds => _whitePmSigma;

    /// <summary>Standard normals one <see cref="Step"/> consumes: 2 (two-state) + PoleCount (flicker) + 1 if white PM.</summary>
    public int NormalsPerStep { get; }

    /// <summary>Standard normals <see cref="Initialize"/> consumes: PoleCount.</summary>
    public int NormalsPerInitialize => PoleCount;

    /// <summary>
    /// Starts a clock: phase and frequency error 0, flicker poles drawn from their stationary distribution (so the
    /// flicker process has no start-up transient). Call <see cref="Reset"/> to impose an upload error.
    /// </summary>
    public void Initialize(ref ClockState state, ReadOnlySpan<double> normals)
    {
        RequireNormals(normals, NormalsPerInitialize);
        state = default;
        for (int k = 0; k < PoleCount; k++)
        {
            state.Poles[k] = _stationarySigma[k] * normals[k];
        }
    }

    /// <summary>
    /// Upload: the broadcast model is refitted, so the phase error becomes <paramref name="phaseErrorSeconds"/> and the
    /// total fractional-frequency error becomes <paramref name="frequencyError"/> (the estimation errors, drawn by the
    /// caller). The flicker poles keep running; the broadcast rate absorbs their current sum.
    /// </summary>
    /// <param name="state">Clock state.</param>
    /// <param name="phaseErrorSeconds">Phase estimation error at the upload (s).</param>
    /// <param name="frequencyError">Fractional-frequency estimation error at the upload (s/s).</param>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Reset(ref ClockState state, double phaseErrorSeconds, double frequencyError)
    {
        state.PhaseSeconds = phaseErrorSeconds;
        state.FrequencyOffset = frequencyError - FlickerSum(ref state);
    }

    /// <summary>Total fractional-frequency error (s/s): the two-state part plus the flicker poles.</summary>
    public double FrequencyError(ref ClockState state) => state.FrequencyOffset + FlickerSum(ref state);

    /// <summary>
    /// Advances one step dt and returns the output phase error (s): the state phase plus white PM.
    /// Normals, in order: two for the two-state model, one per flicker pole, one for white PM (if any).
    /// </summary>
    public double Step(ref ClockState state, ReadOnlySpan<double> normals)
    {
        RequireNormals(normals, NormalsPerStep);
        double flicker = FlickerSum(ref state);
        _twoState.Step(ref state.PhaseSeconds, ref state.FrequencyOffset, normals[0], normals[1]);
        state.PhaseSeconds += flicker * StepSeconds;
        for (int k = 0; k < PoleCount; k++)
        {
            state.Poles[k] = _phi[k] * state.Poles[k] + _innovationSigma[k] * normals[2 + k];
        }

        return HasWhitePm ? state.PhaseSeconds + _whitePmSigma * normals[2 + PoleCount] : state.PhaseSeconds;
    }

    /// <summary>
    /// Exact variance (s^2) of the simulated output phase error <paramref name="steps"/> steps after
    /// <c>Reset(0, 0)</c> from a stationary flicker state, without drift:
    /// Q11(n dt) + sum_k 2 sigma_k^2 dt^2 sum_{j=1}^{n-1} j (1 - phi_k^j) + sigma_wpm^2 (derived: the flicker phase is
    /// dt sum_{i&lt;n} (z_i - z_0) and Cov(z_i - z_0, z_j - z_0) = sigma^2 (phi^|i-j| - phi^i - phi^j + 1)).
    /// O(n PoleCount): not for the hot loop.
    /// </summary>
    public double PhaseErrorVarianceAfterReset(int steps)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(steps);
        double dt = StepSeconds;
        double variance = TwoStateProcessNoise.For(Coefficients.H0, Coefficients.HMinus2, steps * dt).Q11;
        for (int k = 0; k < PoleCount; k++)
        {
            double phi = _phi[k];
            double oneMinusPhi = 1.0 - phi; // absolute error ~1e-16, relative 1e-16 dt/T_k: ample
            double u = 0; // 1 - phi^j, by a recursion of positive terms (no cancellation)
            double sum = 0;
            for (int j = 1; j < steps; j++)
            {
                u = u * phi + oneMinusPhi;
                sum += j * u;
            }

            variance += 2.0 * _stationarySigma[k] * _stationarySigma[k] * dt * dt * sum;
        }

        return variance + _whitePmSigma * _whitePmSigma;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double FlickerSum(ref ClockState state)
    {
        double sum = 0;
        for (int k = 0; k < PoleCount; k++)
        {
            sum += state.Poles[k];
        }

        return sum;
    }

    private static void RequireNormals(ReadOnlySpan<double> normals, int needed)
    {
        if (normals.Length < needed)
        {
            throw new ArgumentException($"Need {needed} standard normals, got {normals.Length}.", nameof(normals));
        }
    }
}

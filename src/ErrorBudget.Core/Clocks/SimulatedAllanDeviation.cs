using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Measures what a <see cref="ClockSimulator"/> actually produces: a dedicated run of free-running reference clocks
/// (no uploads, no estimation error, flicker started stationary) with the same simulator, step and span as the
/// satellites, and their overlapping Allan deviation (NIST SP 1065 eq. 14) at tau = step x 2^k.
/// </summary>
/// <remarks>
/// The satellite clocks themselves are reset at every upload, which cuts their phase record into pieces; the reference
/// clocks are the same process without the cuts, so their ADEV is the simulated noise itself. Random streams:
/// reference clock r at epoch e uses (seed, <see cref="RandomPurpose.ClockNoise"/>, -1 - r, -1, e): trial words below 0
/// never meet a satellite clock's. The Allan variances of the clocks are averaged (equal term counts), then rooted.
/// </remarks>
public static class SimulatedAllanDeviation
{
    /// <summary>Most reference clocks.</summary>
    public const int MaxClocks = 128;

    /// <summary>Budget of simulated steps over all reference clocks (bounds the cost for long runs).</summary>
    public const int StepBudget = 1 << 20;

    /// <summary>Reference clocks used for a record of <paramref name="steps"/> steps: StepBudget / steps, within [8, 128].</summary>
    public static int ClocksFor(int steps) => Math.Clamp(StepBudget / Math.Max(1, steps), 8, MaxClocks);

    /// <summary>
    /// One row per octave k with 2^k &lt;= steps / 2 (at least one term of the estimator; none when steps &lt; 2).
    /// </summary>
    /// <param name="grade">Grade name written into the rows.</param>
    /// <param name="simulator">The simulator of the grade.</param>
    /// <param name="seed">Run seed.</param>
    /// <param name="steps">Steps per reference clock (the run's epochs). Range: &gt;= 0.</param>
    public static IReadOnlyList<ClockAdevRow> Measure(string grade, ClockSimulator simulator, ulong seed, int steps)
    {
        ArgumentNullException.ThrowIfNull(grade);
        ArgumentNullException.ThrowIfNull(simulator);
        ArgumentOutOfRangeException.ThrowIfNegative(steps);
        var octaves = new List<int>();
        for (int m = 1; 2 * m <= steps; m *= 2)
        {
            octaves.Add(m);
        }

        if (octaves.Count == 0)
        {
            return [];
        }

        int clocks = ClocksFor(steps);
        double dt = simulator.StepSeconds;
        var x = new double[steps + 1];
        var normals = new double[Math.Max(simulator.NormalsPerStep, simulator.NormalsPerInitializeAtAge)];
        var variance = new double[octaves.Count];
        for (int r = 0; r < clocks; r++)
        {
            var state = default(ClockState);
            long trialWord = -1 - r;
            var start = normals.AsSpan(0, simulator.NormalsPerInitializeAtAge);
            CounterRng.FillNormals(CounterRng.Key(seed, RandomPurpose.ClockNoise, trialWord, -1, 0), 0, start);
            x[0] = simulator.InitializeAtAge(ref state, 0, 0, 0, start);
            var step = normals.AsSpan(0, simulator.NormalsPerStep);
            for (int e = 1; e <= steps; e++)
            {
                CounterRng.FillNormals(CounterRng.Key(seed, RandomPurpose.ClockNoise, trialWord, -1, e), 0, step);
                x[e] = simulator.Step(ref state, step);
            }

            for (int k = 0; k < octaves.Count; k++)
            {
                double adev = OverlappingAllanDeviation.FromPhase(x, octaves[k], dt);
                variance[k] += adev * adev / clocks;
            }
        }

        double fh = 0.5 / dt;
        var rows = new ClockAdevRow[octaves.Count];
        for (int k = 0; k < octaves.Count; k++)
        {
            double tau = octaves[k] * dt;
            rows[k] = new ClockAdevRow(grade, k, tau, simulator.Coefficients.AllanDeviation(tau, fh), Math.Sqrt(variance[k]), clocks, steps + 1);
        }

        return rows;
    }
}

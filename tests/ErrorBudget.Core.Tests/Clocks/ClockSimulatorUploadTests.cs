using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Tests.Clocks;

/// <summary>
/// Uploads between epochs and clocks started at an age of data (<see cref="ClockSimulator.StepWithUpload"/>,
/// <see cref="ClockSimulator.InitializeAtAge"/>). Every output is linear in the standard normals (no drift, zero
/// estimation error), so its exact variance is the sum of the squared responses to each unit normal: the checks below
/// are deterministic, against the simulator's own exact variance after a reset (derived in
/// <see cref="ClockSimulator.PhaseErrorVarianceAfterReset"/>) and Q11 / Q22 of the two-state model (Brown &amp; Hwang).
/// </summary>
public class ClockSimulatorUploadTests
{
    private const double Dt = 300.0;

    /// <summary>Relative tolerance of exact variances: sums of a few hundred squared terms in double precision.</summary>
    private const double ExactRelative = 1e-9;

    // Rubidium-like with every simulated term: white PM, white FM, flicker FM (a bank of several poles), random-walk FM.
    private static readonly PowerLawCoefficients Coefficients = new(1e-26, 0, 8e-24, 6.5e-28, 2e-34, 0);

    private static ClockSimulator Simulator() => new(Coefficients, Dt, 2e5);

    /// <summary>Exact variance of a linear function of n standard normals: sum of its squared unit responses.</summary>
    private static double ExactVariance(int n, Func<double[], double> output)
    {
        double offset = output(new double[n]);
        double sum = 0;
        for (int i = 0; i < n; i++)
        {
            var unit = new double[n];
            unit[i] = 1;
            double c = output(unit) - offset;
            sum += c * c;
        }

        return sum;
    }

    /// <summary>Phase and total frequency after InitializeAtAge(age) and then `steps` steps; normals consumed in order.</summary>
    private static (double Phase, double Frequency) AgedThenStepped(ClockSimulator sim, double age, int steps, double[] normals)
    {
        var state = default(ClockState);
        int used = sim.NormalsPerInitializeAtAge;
        double phase = sim.InitializeAtAge(ref state, 0, 0, age, normals.AsSpan(0, used));
        for (int i = 0; i < steps; i++, used += sim.NormalsPerStep)
        {
            phase = sim.Step(ref state, normals.AsSpan(used, sim.NormalsPerStep));
        }

        return (phase, sim.FrequencyError(ref state));
    }

    /// <summary>Initialize, an upload r before the end of the first step, then `steps` steps: the path a running clock takes.</summary>
    private static (double Phase, double Frequency) UploadedThenStepped(ClockSimulator sim, double r, int steps, double[] normals)
    {
        var state = default(ClockState);
        int used = sim.NormalsPerInitialize;
        sim.Initialize(ref state, normals.AsSpan(0, used));
        double phase = sim.StepWithUpload(ref state, 0, 0, r, normals.AsSpan(used, sim.NormalsPerStepWithUpload));
        used += sim.NormalsPerStepWithUpload;
        for (int i = 0; i < steps; i++, used += sim.NormalsPerStep)
        {
            phase = sim.Step(ref state, normals.AsSpan(used, sim.NormalsPerStep));
        }

        return (phase, sim.FrequencyError(ref state));
    }

    [Theory]
    [InlineData(0, 0)]
    [InlineData(1, 0)]
    [InlineData(5, 0)]
    [InlineData(40, 0)]
    [InlineData(0, 7)]
    [InlineData(12, 9)]
    public void A_clock_started_m_steps_after_an_upload_has_the_variance_of_m_plus_later_steps_after_a_reset(int m, int later)
    {
        var sim = Simulator();
        Assert.True(sim.PoleCount >= 3, "the test needs a bank of several flicker poles");
        int n = sim.NormalsPerInitializeAtAge + later * sim.NormalsPerStep;

        double variance = ExactVariance(n, z => AgedThenStepped(sim, m * Dt, later, z).Phase);

        // The later steps test the joint law of (flicker phase, pole states) at the start, not only its phase marginal.
        double expected = sim.PhaseErrorVarianceAfterReset(m + later);
        Assert.Equal(expected, variance, ExactRelative * expected);
    }

    [Theory]
    [InlineData(0.0, 0)]
    [InlineData(120.0, 0)]
    [InlineData(120.0, 6)]
    [InlineData(299.0, 25)]
    public void An_upload_between_epochs_gives_the_same_law_as_a_clock_started_at_that_age(double r, int steps)
    {
        var sim = Simulator();
        int pathNormals = sim.NormalsPerInitialize + sim.NormalsPerStepWithUpload + steps * sim.NormalsPerStep;
        int startNormals = sim.NormalsPerInitializeAtAge;
        double age = r + steps * Dt;

        double pathPhase = ExactVariance(pathNormals, z => UploadedThenStepped(sim, r, steps, z).Phase);
        double startPhase = ExactVariance(startNormals, z => AgedThenStepped(sim, age, 0, z).Phase);
        double pathFrequency = ExactVariance(pathNormals, z => UploadedThenStepped(sim, r, steps, z).Frequency);
        double startFrequency = ExactVariance(startNormals, z => AgedThenStepped(sim, age, 0, z).Frequency);

        // Derived: the two-state part is exact over the whole age; flicker follows the m-step law of the reset.
        var full = TwoStateProcessNoise.For(Coefficients.H0, Coefficients.HMinus2, age);
        var whole = TwoStateProcessNoise.For(Coefficients.H0, Coefficients.HMinus2, steps * Dt);
        double phase = sim.PhaseErrorVarianceAfterReset(steps) - whole.Q11 + full.Q11;
        Assert.Equal(phase, pathPhase, ExactRelative * phase);
        Assert.Equal(phase, startPhase, ExactRelative * phase);

        // Derived: Var(z_m - z_0) = 2 sigma_k^2 (1 - phi_k^m) per pole, plus Q22(age) of the random walk.
        double frequency = full.Q22;
        for (int k = 0; k < sim.PoleCount; k++)
        {
            frequency += 2 * sim.Flicker!.StationarySigma(k) * sim.Flicker.StationarySigma(k) * (1 - Math.Pow(sim.Flicker.Phi(k), steps));
        }

        Assert.Equal(frequency, pathFrequency, ExactRelative * frequency);
        Assert.Equal(frequency, startFrequency, ExactRelative * frequency);
    }

    [Fact]
    public void Long_ages_use_the_closed_form_sums_and_keep_the_same_law()
    {
        // 5000 steps is past the term-by-term limit (4096): the geometric closed form takes over.
        var sim = new ClockSimulator(Coefficients, Dt, 3e6);
        const int m = 5000, later = 2;
        int n = sim.NormalsPerInitializeAtAge + later * sim.NormalsPerStep;

        double variance = ExactVariance(n, z => AgedThenStepped(sim, m * Dt, later, z).Phase);

        // Tolerance 1e-7 relative: the closed form cancels terms of size m against a sum of size m^3 q^2 (derived bound).
        double expected = sim.PhaseErrorVarianceAfterReset(m + later);
        Assert.Equal(expected, variance, 1e-7 * expected);
    }

    [Fact]
    public void At_age_zero_the_clock_error_is_the_estimation_error()
    {
        var sim = Simulator();
        var state = default(ClockState);
        var normals = new double[sim.NormalsPerInitializeAtAge];
        normals.AsSpan().Fill(0.7);
        normals[^1] = 0; // no white PM draw

        double phase = sim.InitializeAtAge(ref state, 2e-9, -3e-14, 0.0, normals);

        // Exact: nothing has grown yet.
        Assert.Equal(2e-9, phase);
        Assert.Equal(-3e-14, sim.FrequencyError(ref state), 1e-28);
    }

    [Fact]
    public void An_upload_age_beyond_one_step_is_refused()
    {
        var sim = Simulator();
        var state = default(ClockState);
        var normals = new double[sim.NormalsPerStepWithUpload];

        Assert.Throws<ArgumentOutOfRangeException>(() => sim.StepWithUpload(ref state, 0, 0, Dt * 1.5, normals));
    }
}

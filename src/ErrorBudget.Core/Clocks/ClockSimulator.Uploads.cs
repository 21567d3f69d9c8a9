using System.Globalization;

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Uploads that fall between epochs, and a clock started at an arbitrary age of data.
/// </summary>
/// <remarks>
/// The flicker poles live on the epoch grid. An upload at t_u inside the step (t_{e-1}, t_e] is applied as:
/// poles advance to t_e, the broadcast model absorbs the new pole sum (<see cref="Reset"/>), then phase and frequency
/// follow the exact two-state transition over the age r = t_e - t_u with the total frequency error equal to the
/// estimation error (flicker held at its absorbed value over r &lt; dt, the rectangle rule of <see cref="Step"/>).
/// <see cref="InitializeAtAge"/> draws, in one go, the exact joint distribution of the state that this update followed
/// by floor(age / dt) full steps produces, so a run can start with staggered ages of data without simulating the time
/// before t = 0.
/// </remarks>
public sealed partial class ClockSimulator
{
    /// <summary>Below this many steps the flicker sums are added term by term (positive terms); above, in closed form.</summary>
    private const int DirectSumSteps = 4096;

    /// <summary>Standard normals <see cref="StepWithUpload"/> consumes: <see cref="NormalsPerStep"/>, in the same roles.</summary>
    public int NormalsPerStepWithUpload => NormalsPerStep;

    /// <summary>
    /// Standard normals <see cref="InitializeAtAge"/> consumes: 2 (two-state over the age) + PoleCount (pole states at the
    /// upload) + 2 PoleCount (each pole's flicker phase and end state) + 1 if white PM.
    /// </summary>
    public int NormalsPerInitializeAtAge => 2 + 3 * PoleCount + (HasWhitePm ? 1 : 0);

    /// <summary>
    /// Advances one step dt during which an upload happened <paramref name="ageSeconds"/> before the end of the step,
    /// and returns the output phase error (s) at the end of the step.
    /// Normals, in order: two for the two-state transition over the age, one per pole, one for white PM (if any).
    /// </summary>
    /// <param name="state">Clock state at the start of the step; at the end of the step on return.</param>
    /// <param name="phaseErrorSeconds">Phase estimation error at the upload (s).</param>
    /// <param name="frequencyError">Fractional-frequency estimation error at the upload (s/s).</param>
    /// <param name="ageSeconds">Age of data at the end of the step, t_e - t_u. Range: [0, dt].</param>
    /// <param name="normals">Independent standard normals, at least <see cref="NormalsPerStepWithUpload"/>.</param>
    public double StepWithUpload(ref ClockState state, double phaseErrorSeconds, double frequencyError, double ageSeconds, ReadOnlySpan<double> normals)
    {
        RequireNormals(normals, NormalsPerStep);
        if (!(ageSeconds >= 0 && ageSeconds <= StepSeconds))
        {
            throw new ArgumentOutOfRangeException(nameof(ageSeconds), ageSeconds, string.Create(CultureInfo.InvariantCulture, $"Range: [0, {StepSeconds}] s."));
        }

        for (int k = 0; k < PoleCount; k++)
        {
            state.Poles[k] = _phi[k] * state.Poles[k] + _innovationSigma[k] * normals[2 + k];
        }

        Reset(ref state, phaseErrorSeconds, frequencyError);
        AdvanceTwoState(ref state, frequencyError, ageSeconds, normals[0], normals[1]);
        return HasWhitePm ? state.PhaseSeconds + _whitePmSigma * normals[2 + PoleCount] : state.PhaseSeconds;
    }

    /// <summary>
    /// Starts a clock whose last upload was <paramref name="ageSeconds"/> ago, and returns the output phase error (s) now.
    /// Same distribution as <see cref="Initialize"/>, then (at the upload) <see cref="StepWithUpload"/> with age
    /// r = age - m dt, then m = floor(age / dt) calls of <see cref="Step"/>; drawn directly in O(PoleCount).
    /// </summary>
    /// <remarks>
    /// Derived: with z_0 a pole's state at the upload (stationary, sd sigma), phi its factor, b its innovation sd and
    /// q = 1 - phi, the flicker phase F = dt sum_{i&lt;m} (z_i - z_0) and the end state z_m are jointly normal given z_0:
    /// E[F] = dt z_0 ((1 - phi^m)/q - m), E[z_m] = phi^m z_0,
    /// Var F = (b dt / q)^2 sum_{j=1}^{m-1} (1 - phi^j)^2, Cov(F, z_m) = b^2 (dt / q) sum_{j=1}^{m-1} (1 - phi^j) phi^j,
    /// Var z_m = sigma^2 (1 - phi^(2m)). The two-state part is the exact transition over the whole age (composition of
    /// exact transitions). Normals, in order: two for the two-state part, PoleCount for z_0, two per pole for (F, z_m),
    /// one for white PM (if any).
    /// </remarks>
    /// <param name="state">Overwritten with the clock state now.</param>
    /// <param name="phaseErrorSeconds">Phase estimation error at the upload (s).</param>
    /// <param name="frequencyError">Fractional-frequency estimation error at the upload (s/s).</param>
    /// <param name="ageSeconds">Age of data now. Range: finite, &gt;= 0 s.</param>
    /// <param name="normals">Independent standard normals, at least <see cref="NormalsPerInitializeAtAge"/>.</param>
    public double InitializeAtAge(ref ClockState state, double phaseErrorSeconds, double frequencyError, double ageSeconds, ReadOnlySpan<double> normals)
    {
        RequireNormals(normals, NormalsPerInitializeAtAge);
        if (!(ageSeconds >= 0) || !double.IsFinite(ageSeconds))
        {
            throw new ArgumentOutOfRangeException(nameof(ageSeconds), ageSeconds, "Range: finite, >= 0 s.");
        }

        long m = (long)Math.Floor(ageSeconds / StepSeconds);
        state = default;
        double poleSumAtUpload = 0;
        double flickerPhase = 0;
        for (int k = 0; k < PoleCount; k++)
        {
            double z0 = _stationarySigma[k] * normals[2 + k];
            poleSumAtUpload += z0;
            FlickerAgeing(k, m, out double meanF, out double meanZ, out double l11, out double l21, out double l22);
            double n1 = normals[2 + PoleCount + 2 * k];
            double n2 = normals[3 + PoleCount + 2 * k];
            flickerPhase += meanF * z0 + l11 * n1;
            state.Poles[k] = meanZ * z0 + l21 * n1 + l22 * n2;
        }

        // The broadcast model absorbed the pole sum at the upload; the two-state part runs over the whole age.
        state.PhaseSeconds = phaseErrorSeconds;
        state.FrequencyOffset = frequencyError - poleSumAtUpload;
        AdvanceTwoState(ref state, frequencyError, ageSeconds, normals[0], normals[1]);
        state.PhaseSeconds += flickerPhase;
        return HasWhitePm ? state.PhaseSeconds + _whitePmSigma * normals[2 + 3 * PoleCount] : state.PhaseSeconds;
    }

    /// <summary>Exact two-state transition over <paramref name="seconds"/> with the total frequency error held at <paramref name="totalFrequency"/> for the phase.</summary>
    private void AdvanceTwoState(ref ClockState state, double totalFrequency, double seconds, double n1, double n2)
    {
        var q = TwoStateProcessNoise.For(Coefficients.H0, Coefficients.HMinus2, seconds);
        double drift = Coefficients.DriftPerSecond;
        state.PhaseSeconds += totalFrequency * seconds + 0.5 * drift * seconds * seconds + q.L11 * n1;
        state.FrequencyOffset += drift * seconds + q.L21 * n1 + q.L22 * n2;
    }

    /// <summary>Mean factors and Cholesky factor of (F, z_m) given z_0 for pole k after m full steps (see <see cref="InitializeAtAge"/>).</summary>
    private void FlickerAgeing(int k, long m, out double meanF, out double meanZ, out double l11, out double l21, out double l22)
    {
        double dt = StepSeconds;
        double phi = _phi[k];
        double q = 1.0 - phi;
        double b2 = _innovationSigma[k] * _innovationSigma[k];
        double phiM = Math.Pow(phi, m);
        meanZ = phiM;
        meanF = dt * ((1.0 - phiM) / q - m);
        double sumSq; // sum_{j=1}^{m-1} (1 - phi^j)^2
        double sumCross; // sum_{j=1}^{m-1} (1 - phi^j) phi^j
        if (m <= DirectSumSteps)
        {
            sumSq = 0;
            sumCross = 0;
            double u = 0; // 1 - phi^j by a recursion of positive terms (no cancellation)
            for (long j = 1; j < m; j++)
            {
                u = u * phi + q;
                sumSq += u * u;
                sumCross += u * (1.0 - u);
            }
        }
        else
        {
            // Geometric sums; here m q >= 4096 q is not small, so the cancellation stays mild.
            double a = phi * (1.0 - Math.Pow(phi, m - 1)) / q;
            double b = phi * phi * (1.0 - Math.Pow(phi, 2 * (m - 1))) / (1.0 - phi * phi);
            sumSq = Math.Max(0.0, m - 1 - 2.0 * a + b);
            sumCross = Math.Max(0.0, a - b);
        }

        double varF = b2 * dt * dt * sumSq / (q * q);
        double cov = b2 * dt * sumCross / q;
        double varZ = m == 0 ? 0.0 : _stationarySigma[k] * _stationarySigma[k] * (1.0 - phiM * phiM);
        l11 = Math.Sqrt(varF);
        l21 = l11 > 0 ? cov / l11 : 0.0;
        l22 = Math.Sqrt(Math.Max(0.0, varZ - l21 * l21));
    }
}

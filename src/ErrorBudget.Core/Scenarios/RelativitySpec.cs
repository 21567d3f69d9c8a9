namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [relativity]: which relativistic terms the system applies, and how. Every term is applied by default.
/// The truth contains what is left (see <see cref="Relativity.RelativisticClockError"/> for the satellite-level
/// terms, <see cref="Relativity.RelativisticUserBias"/> for the user-level ones); the receiver's assumed model
/// knows none of it.
/// </summary>
/// <param name="FrequencyOffset">Secular frequency offset: applied, missed or preset for another orbit.</param>
/// <param name="PresetSemiMajorAxisMeters">Nominal orbit the factory offset was set for, used by
/// <see cref="FrequencyOffsetMode.Preset"/> (a shell's own <see cref="ShellSpec.RelativityPresetSemiMajorAxisMeters"/>
/// overrides it); NaN when not given. Range: (6,378,137 m, 1e8 m].</param>
/// <param name="FrequencyOffsetFactor">Fraction of the offset actually applied (1 = all). Range: [0, 2].</param>
/// <param name="EccentricityTerm">Periodic term F e sqrt(A) sin E: applied or missed by the user.</param>
/// <param name="EccentricityFactor">Fraction of the periodic term applied (1 = all). Range: [0, 2].</param>
/// <param name="Sagnac">Earth-rotation correction of the range: applied or missed by the user.</param>
/// <param name="Shapiro">Gravitational path delay: applied or missed by the user.</param>
/// <param name="GroundAbsorbs">What the ground clock estimation absorbs of a constant residual rate.</param>
public sealed record RelativitySpec(
    FrequencyOffsetMode FrequencyOffset,
    double PresetSemiMajorAxisMeters,
    double FrequencyOffsetFactor,
    RelativityTermMode EccentricityTerm,
    double EccentricityFactor,
    RelativityTermMode Sagnac,
    RelativityTermMode Shapiro,
    GroundAbsorption GroundAbsorbs)
{
    /// <summary>Everything applied in full (the default when [relativity] is left out).</summary>
    public static RelativitySpec AllApplied { get; } = new(
        FrequencyOffsetMode.Applied, double.NaN, 1.0, RelativityTermMode.Applied, 1.0,
        RelativityTermMode.Applied, RelativityTermMode.Applied, GroundAbsorption.Offset);

    /// <summary>
    /// The preset orbit of a shell, metres: its own override when given, else <see cref="PresetSemiMajorAxisMeters"/>
    /// (NaN when neither is given; the loader refuses that with <see cref="FrequencyOffsetMode.Preset"/>).
    /// </summary>
    public double PresetFor(ShellSpec shell)
    {
        ArgumentNullException.ThrowIfNull(shell);
        return double.IsNaN(shell.RelativityPresetSemiMajorAxisMeters) ? PresetSemiMajorAxisMeters : shell.RelativityPresetSemiMajorAxisMeters;
    }
}

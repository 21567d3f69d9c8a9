using System.Runtime.CompilerServices;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// The satellite-level relativistic truth: what a scenario's [relativity] choices leave in each satellite's
/// clock, as a range error in metres with the sign of <see cref="ClockRateError"/> and of the clock component of
/// <see cref="Errors.SatelliteErrorSampler"/> (clockRange = -c (dt_true - dt_broadcast); a clock running fast
/// makes the range short, a negative error). Deterministic: the same in every trial.
/// <para>
/// Frequency offset: the clock shows the residual rate y = Net(actual a) - applied, where applied is
/// factor x Net(a) ("applied"), 0 ("missed") or factor x Net(preset a) ("preset"), Net from
/// <see cref="SecularRate.Net"/> with the WGS-84 GM the orbits are propagated with. It accumulates over the
/// time T that <see cref="GroundAbsorption"/> gives: the age of data ("offset"), nothing ("rate"), or the
/// time since the start ("none"). Range error -c y T.
/// </para>
/// <para>
/// Eccentricity term: the user is to add dt_r = F e sqrt(A) sin E (IS-GPS-200, 20.3.3.3.3.1) to the broadcast
/// clock, which by that convention leaves it out, so no ground setting absorbs it; a user applying the fraction f
/// (0 when missed) keeps the range error -c (1 - f) dt_r.
/// </para>
/// Satellites are indexed as in <see cref="Constellation"/> (shell by shell).
/// </summary>
public sealed class RelativisticClockError
{
    private readonly double[] _residualRate;
    private readonly double[] _periodicCoefficient;
    private readonly GroundAbsorption _ground;

    /// <summary>Per-satellite terms of <paramref name="scenario"/>'s constellation under its [relativity] table.</summary>
    public RelativisticClockError(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        RelativitySpec spec = scenario.Relativity;
        _ground = spec.GroundAbsorbs;
        int n = scenario.TotalSatellites;
        _residualRate = new double[n];
        _periodicCoefficient = new double[n];
        double eccentricityKept = spec.EccentricityTerm == RelativityTermMode.Missed ? 1.0 : 1.0 - spec.EccentricityFactor;
        int s = 0;
        foreach (ShellSpec shell in scenario.Shells)
        {
            double rate = ResidualRate(spec, shell);
            double coefficient = eccentricityKept * RelativityConstants.F * shell.Eccentricity * Math.Sqrt(shell.SemiMajorAxisMeters);
            for (int k = 0; k < shell.Satellites; k++, s++)
            {
                _residualRate[s] = rate;
                _periodicCoefficient[s] = coefficient;
            }
        }

        IsActive = Array.Exists(_residualRate, y => y != 0.0) && _ground != GroundAbsorption.Rate
            || Array.Exists(_periodicCoefficient, k => k != 0.0);
    }

    /// <summary>False when every satellite's term is zero at all times (then callers may skip it).</summary>
    public bool IsActive { get; }

    /// <summary>Fractional frequency offset the system applies to a clock of <paramref name="shell"/>, unitless.</summary>
    public static double AppliedRate(RelativitySpec spec, ShellSpec shell)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(shell);
        double gm = Wgs84.GravitationalParameter;
        return spec.FrequencyOffset switch
        {
            FrequencyOffsetMode.Missed => 0.0,
            FrequencyOffsetMode.Preset => spec.FrequencyOffsetFactor * SecularRate.Net(spec.PresetFor(shell), gm),
            _ => spec.FrequencyOffsetFactor * SecularRate.Net(shell.SemiMajorAxisMeters, gm),
        };
    }

    /// <summary>Residual rate y = Net(actual a) - applied of a clock of <paramref name="shell"/>, unitless (positive: runs fast).</summary>
    public static double ResidualRate(RelativitySpec spec, ShellSpec shell) =>
        ClockRateError.ResidualRate(SecularRate.Net(shell.SemiMajorAxisMeters, Wgs84.GravitationalParameter), AppliedRate(spec, shell));

    /// <summary>Residual rate of satellite <paramref name="satellite"/>, unitless.</summary>
    public double ResidualRateOf(int satellite) => _residualRate[satellite];

    /// <summary>
    /// Time over which the residual rate has accumulated, seconds: the age of data ("offset"), 0 ("rate") or the
    /// time since the start ("none").
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double AccumulationSeconds(double ageOfDataSeconds, double timeSeconds) => _ground switch
    {
        GroundAbsorption.Rate => 0.0,
        GroundAbsorption.None => timeSeconds,
        _ => ageOfDataSeconds,
    };

    /// <summary>Range error of the residual frequency offset, -c y T, metres.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double FrequencyOffsetRangeErrorMeters(int satellite, double ageOfDataSeconds, double timeSeconds) =>
        ClockRateError.RangeErrorMeters(_residualRate[satellite], AccumulationSeconds(ageOfDataSeconds, timeSeconds));

    /// <summary>Range error of the unapplied part of the periodic term, -c (1 - f) F e sqrt(A) sin E, metres.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double EccentricityRangeErrorMeters(int satellite, double eccentricAnomalyRad) =>
        -PhysicalConstants.SpeedOfLight * _periodicCoefficient[satellite] * Math.Sin(eccentricAnomalyRad);

    /// <summary>
    /// Both satellite-level terms: the value to add to the clock component (k = 3) of the satellite error buffer,
    /// metres. <paramref name="ageOfDataSeconds"/> from <see cref="Errors.SatelliteErrorSampler.AgeOfData"/>,
    /// <paramref name="timeSeconds"/> since the scenario start, E from <see cref="SatelliteState.EccentricAnomalyRad"/>.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double ClockRangeErrorMeters(int satellite, double ageOfDataSeconds, double timeSeconds, double eccentricAnomalyRad) =>
        FrequencyOffsetRangeErrorMeters(satellite, ageOfDataSeconds, timeSeconds) + EccentricityRangeErrorMeters(satellite, eccentricAnomalyRad);
}

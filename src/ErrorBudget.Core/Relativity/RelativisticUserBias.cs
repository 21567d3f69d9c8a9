using System.Runtime.CompilerServices;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// The user-level relativistic truth: the range error, measured minus modelled in metres, that a user who misses
/// the Sagnac correction and/or the Shapiro delay keeps for one satellite. Both depend on the user-satellite pair,
/// so they are computed per pair (unlike the satellite-level terms of <see cref="RelativisticClockError"/>).
/// <para>
/// Sagnac missed: the signal travels c tau = |r_s - r_r| + c <see cref="Sagnac.DelaySeconds"/> in an inertial
/// frame while the user models |r_s - r_r| in ECEF, so the error is +c DelaySeconds (negative for a satellite east
/// of the user). Shapiro missed: the signal arrives late by <see cref="Shapiro.DelayMeters"/>, always positive.
/// Earth rotation rate and GM are the WGS-84 values the orbits use. Zero for a term that is applied. The satellite
/// position at the receive epoch stands in for the transmit position: its 0.07 s of motion changes the Sagnac term
/// by under 1 mm (derived: omegaE x 300 m x 6.4e6 m / c^2 = 1.6e-12 s).
/// </para>
/// </summary>
public sealed class RelativisticUserBias
{
    private readonly bool _sagnac;
    private readonly bool _shapiro;

    /// <summary>The user-level terms of a [relativity] table.</summary>
    public RelativisticUserBias(RelativitySpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        _sagnac = spec.Sagnac == RelativityTermMode.Missed;
        _shapiro = spec.Shapiro == RelativityTermMode.Missed;
    }

    /// <summary>False when both terms are applied: <see cref="RangeErrorMeters"/> is then always 0 and callers may skip it.</summary>
    public bool IsActive => _sagnac || _shapiro;

    /// <summary>
    /// Range error of the missed user-level terms, metres (add it to the satellite's pseudorange error eps).
    /// Positions ECEF in metres (satellite at the epoch, receiver at the grid point). Does not allocate.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double RangeErrorMeters(Vec3 satelliteEcef, Vec3 receiverEcef) =>
        (_sagnac ? SagnacMeters(satelliteEcef, receiverEcef) : 0.0) + (_shapiro ? ShapiroMeters(satelliteEcef, receiverEcef) : 0.0);

    /// <summary>The Sagnac term alone (whatever the mode), metres.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double SagnacMeters(Vec3 satelliteEcef, Vec3 receiverEcef) =>
        PhysicalConstants.SpeedOfLight * Sagnac.DelaySeconds(satelliteEcef, receiverEcef, Wgs84.EarthRotationRateRadPerSecond);

    /// <summary>The Shapiro term alone (whatever the mode), metres.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double ShapiroMeters(Vec3 satelliteEcef, Vec3 receiverEcef) =>
        Shapiro.DelayMeters(satelliteEcef.Norm, receiverEcef.Norm, (satelliteEcef - receiverEcef).Norm, Wgs84.GravitationalParameter);

    /// <summary>True when the Sagnac correction is missed.</summary>
    public bool SagnacMissed => _sagnac;

    /// <summary>True when the Shapiro delay is missed.</summary>
    public bool ShapiroMissed => _shapiro;
}

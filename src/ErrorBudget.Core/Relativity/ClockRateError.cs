using System.Runtime.CompilerServices;
using ErrorBudget.Core.Geodesy;

namespace ErrorBudget.Core.Relativity;

/// <summary>
/// Range errors from a relativistic rate that is not (fully) compensated: a missed factory offset (applied = 0),
/// an offset preset for another orbit (applied = <see cref="SecularRate.Net"/> of the nominal a), and so on.
/// <para>
/// Sign convention (used by every member): a positive residual rate y makes the satellite clock run fast; after
/// an age T since the last upload (when the ground segment last absorbed the clock's offset) it reads ahead of
/// system time by y T, so a signal stamped t_sv actually left earlier than t_sv. The receiver infers too short a
/// flight: the pseudorange comes out short, and the range error (measured minus modelled) is -c y T.
/// </para>
/// Units: y unitless, ages in seconds, range errors in metres.
/// </summary>
public static class ClockRateError
{
    /// <summary>
    /// Rate the clock shows after the factory offset, y_actual - y_applied, unitless (positive: runs fast). For a
    /// clock whose offset was set for a nominal orbit: ResidualRate(Net(actual a), Net(nominal a)).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double ResidualRate(double actualNet, double appliedNet) => actualNet - appliedNet;

    /// <summary>Time the satellite clock reads ahead of system time, y T, seconds (positive: ahead).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double ClockOffsetSeconds(double residualRate, double ageSeconds) => residualRate * ageSeconds;

    /// <summary>Range error, measured minus modelled, -c y T in metres (negative for a fast clock).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double RangeErrorMeters(double residualRate, double ageSeconds) =>
        -PhysicalConstants.SpeedOfLight * residualRate * ageSeconds;
}

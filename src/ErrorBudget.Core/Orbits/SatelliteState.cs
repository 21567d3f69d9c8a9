using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Orbits;

/// <summary>State of one satellite at one epoch, filled by <see cref="Constellation.Propagate"/>. Fields for speed.</summary>
public struct SatelliteState
{
    /// <summary>Position in ECEF (WGS-84 axes), metres.</summary>
    public Vec3 PositionEcef;

    /// <summary>Position in the inertial frame of <see cref="KeplerElements"/>, metres.</summary>
    public Vec3 PositionInertial;

    /// <summary>Velocity in the inertial frame, m/s.</summary>
    public Vec3 VelocityInertial;

    /// <summary>Eccentric anomaly E, radians (continuous in time, not reduced to one turn).</summary>
    public double EccentricAnomalyRad;
}

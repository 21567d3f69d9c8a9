using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Orbits;

/// <summary>
/// A set of satellites on two-body orbits (WGS-84 GM, no J2), propagated to ECEF at any time from the start.
/// Satellites are indexed shell by shell, plane by plane, slot by slot.
/// </summary>
public sealed class Constellation
{
    private const double DegToRad = Math.PI / 180.0;

    private readonly OrbitGeometry[] _geometry;

    private Constellation(SatelliteInfo[] satellites)
    {
        Satellites = satellites;
        _geometry = new OrbitGeometry[satellites.Length];
        for (int i = 0; i < satellites.Length; i++)
        {
            _geometry[i] = OrbitGeometry.From(satellites[i].Elements, Wgs84.GravitationalParameter);
        }
    }

    /// <summary>All satellites; <see cref="SatelliteInfo.Index"/> equals the position in this list.</summary>
    public IReadOnlyList<SatelliteInfo> Satellites { get; }

    /// <summary>Number of satellites.</summary>
    public int Count => _geometry.Length;

    /// <summary>
    /// Builds Walker-delta T/P/F shells. With S = T/P satellites per plane, plane j (0 .. P-1) and slot k
    /// (0 .. S-1), in degrees: RAAN_j = RaanOffset + j 360/P and M = MeanAnomalyOffset + k 360/S + j F 360/T.
    /// Inclination, a, e and argument of perigee come from the shell. Angles are stored in [0, 2pi).
    /// </summary>
    /// <exception cref="ArgumentException">A shell with T or P below 1, P not dividing T, or e outside [0, 1).</exception>
    public static Constellation FromShells(IReadOnlyList<ShellSpec> shells)
    {
        var satellites = new List<SatelliteInfo>();
        for (int shellIndex = 0; shellIndex < shells.Count; shellIndex++)
        {
            ShellSpec shell = shells[shellIndex];
            Validate(shell);
            int perPlane = shell.Satellites / shell.Planes;
            for (int plane = 0; plane < shell.Planes; plane++)
            {
                double raanDeg = shell.RaanOffsetDeg + plane * 360.0 / shell.Planes;
                for (int slot = 0; slot < perPlane; slot++)
                {
                    double meanAnomalyDeg = shell.MeanAnomalyOffsetDeg + slot * 360.0 / perPlane
                        + plane * (double)shell.Phasing * 360.0 / shell.Satellites;
                    var elements = new KeplerElements(
                        shell.SemiMajorAxisMeters,
                        shell.Eccentricity,
                        shell.InclinationDeg * DegToRad,
                        WrapDeg(raanDeg) * DegToRad,
                        WrapDeg(shell.ArgumentOfPerigeeDeg) * DegToRad,
                        WrapDeg(meanAnomalyDeg) * DegToRad);
                    satellites.Add(new SatelliteInfo(satellites.Count, shellIndex, shell.Name, plane, slot, elements));
                }
            }
        }

        return new Constellation(satellites.ToArray());
    }

    /// <summary>
    /// Fills <paramref name="states"/>[0 .. Count-1] at <paramref name="tSeconds"/> after the start: inertial
    /// position and velocity by Kepler, then ECEF = rotation about z by -(theta0 + omegaE t), with theta0 =
    /// <paramref name="startRotationAngleRad"/> (e.g. <see cref="EarthRotation.EarthRotationAngle"/> of the start)
    /// and omegaE = <see cref="Wgs84.EarthRotationRateRadPerSecond"/>. Does not allocate.
    /// </summary>
    /// <exception cref="ArgumentException"><paramref name="states"/> is shorter than <see cref="Count"/>.</exception>
    public void Propagate(double tSeconds, double startRotationAngleRad, Span<SatelliteState> states)
    {
        if (states.Length < _geometry.Length)
        {
            throw new ArgumentException("The state span is shorter than the constellation.", nameof(states));
        }

        double angle = startRotationAngleRad + Wgs84.EarthRotationRateRadPerSecond * tSeconds;
        (double sin, double cos) = Math.SinCos(angle);
        for (int i = 0; i < _geometry.Length; i++)
        {
            ref SatelliteState s = ref states[i];
            _geometry[i].State(tSeconds, out s.PositionInertial, out s.VelocityInertial, out s.EccentricAnomalyRad);
            s.PositionEcef = EarthRotation.InertialToEarthFixed(s.PositionInertial, cos, sin);
        }
    }

    private static void Validate(ShellSpec shell)
    {
        if (shell.Satellites < 1 || shell.Planes < 1 || shell.Satellites % shell.Planes != 0)
        {
            throw new ArgumentException(
                $"Shell '{shell.Name}': satellites ({shell.Satellites}) must be a positive multiple of planes ({shell.Planes}).",
                nameof(shell));
        }

        if (!(shell.Eccentricity >= 0.0 && shell.Eccentricity < 1.0))
        {
            throw new ArgumentException($"Shell '{shell.Name}': eccentricity must be in [0, 1).", nameof(shell));
        }
    }

    private static double WrapDeg(double deg)
    {
        double wrapped = deg % 360.0;
        if (wrapped < 0.0)
        {
            wrapped += 360.0;
        }

        return wrapped >= 360.0 ? 0.0 : wrapped;
    }
}

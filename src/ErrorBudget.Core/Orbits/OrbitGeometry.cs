using System.Runtime.CompilerServices;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Orbits;

/// <summary>
/// Per-orbit quantities that do not change with time (perifocal basis, mean motion), computed once so the
/// propagation loop only solves Kepler's equation. The single code path behind <see cref="Kepler.StateInertial"/>.
/// </summary>
internal readonly struct OrbitGeometry
{
    private readonly double _a;
    private readonly double _e;
    private readonly double _m0;
    private readonly double _n;
    private readonly double _sqrtOneMinusE2;
    private readonly double _sqrtGmA;
    private readonly Vec3 _p; // unit vector to perigee
    private readonly Vec3 _q; // unit vector 90 deg ahead of perigee in the orbit plane

    private OrbitGeometry(double a, double e, double m0, double n, double sqrtGmA, Vec3 p, Vec3 q)
    {
        _a = a;
        _e = e;
        _m0 = m0;
        _n = n;
        _sqrtOneMinusE2 = Math.Sqrt(1.0 - e * e);
        _sqrtGmA = sqrtGmA;
        _p = p;
        _q = q;
    }

    public static OrbitGeometry From(in KeplerElements el, double gm)
    {
        (double sinO, double cosO) = Math.SinCos(el.RaanRad);
        (double sinW, double cosW) = Math.SinCos(el.ArgumentOfPerigeeRad);
        (double sinI, double cosI) = Math.SinCos(el.InclinationRad);
        var p = new Vec3(
            cosW * cosO - sinW * sinO * cosI,
            cosW * sinO + sinW * cosO * cosI,
            sinW * sinI);
        var q = new Vec3(
            -sinW * cosO - cosW * sinO * cosI,
            -sinW * sinO + cosW * cosO * cosI,
            cosW * sinI);
        double a = el.SemiMajorAxisMeters;
        return new OrbitGeometry(a, el.Eccentricity, el.MeanAnomalyAtStartRad, Kepler.MeanMotion(a, gm), Math.Sqrt(gm * a), p, q);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void State(double tSeconds, out Vec3 position, out Vec3 velocity, out double eccentricAnomalyRad)
    {
        double bigE = Kepler.SolveEccentricAnomaly(_m0 + _n * tSeconds, _e);
        (double sinE, double cosE) = Math.SinCos(bigE);

        // Perifocal coordinates: x toward perigee, y along the motion at perigee.
        double x = _a * (cosE - _e);
        double y = _a * _sqrtOneMinusE2 * sinE;
        double r = _a * (1.0 - _e * cosE);
        double vScale = _sqrtGmA / r;
        double vx = -vScale * sinE;
        double vy = vScale * _sqrtOneMinusE2 * cosE;

        position = new Vec3(x * _p.X + y * _q.X, x * _p.Y + y * _q.Y, x * _p.Z + y * _q.Z);
        velocity = new Vec3(vx * _p.X + vy * _q.X, vx * _p.Y + vy * _q.Y, vx * _p.Z + vy * _q.Z);
        eccentricAnomalyRad = bigE;
    }
}

using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Orbits;

/// <summary>Two-body (Keplerian) orbit relations. No J2 or other perturbations. SI units.</summary>
public static class Kepler
{
    private const double TwoPi = 2.0 * Math.PI;
    private const int MaxIterations = 60;

    /// <summary>
    /// Solves Kepler's equation M = E - e sin E for the eccentric anomaly E (radians). Newton's method from
    /// the start E0 = M + 0.85 e sign(sin M) on M reduced to [-pi, pi], kept inside the bracket
    /// [M - e, M + e] by bisection, so it cannot diverge. The returned E is continuous in M (whole turns of M are
    /// added back). Residual |E - e sin E - M| &lt;= 1e-12 rad for e in [0, 0.9] and |M| up to about 1e3 rad.
    /// Range: eccentricity in [0, 1).
    /// </summary>
    public static double SolveEccentricAnomaly(double meanAnomalyRad, double eccentricity)
    {
        if (!(eccentricity >= 0.0 && eccentricity < 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(eccentricity), eccentricity, "Eccentricity must be in [0, 1).");
        }

        if (eccentricity == 0.0)
        {
            return meanAnomalyRad;
        }

        double turns = Math.Round(meanAnomalyRad / TwoPi);
        double m = meanAnomalyRad - turns * TwoPi;

        // f(E) = E - e sin E - m is increasing, f(m - e) <= 0 <= f(m + e).
        double lo = m - eccentricity, hi = m + eccentricity;
        double e = m + 0.85 * eccentricity * Math.Sign(Math.Sin(m));
        for (int i = 0; i < MaxIterations; i++)
        {
            (double sinE, double cosE) = Math.SinCos(e);
            double f = e - eccentricity * sinE - m;
            if (f == 0.0)
            {
                break;
            }

            if (f < 0.0)
            {
                lo = e;
            }
            else
            {
                hi = e;
            }

            double next = e - f / (1.0 - eccentricity * cosE);
            if (!(next > lo && next < hi))
            {
                next = 0.5 * (lo + hi);
            }

            double step = next - e;
            e = next;
            if (Math.Abs(step) <= 1e-15 * Math.Max(1.0, Math.Abs(e)))
            {
                break;
            }
        }

        return e + turns * TwoPi;
    }

    /// <summary>Mean motion n = sqrt(GM / a^3), rad/s. a in metres, gm in m^3/s^2.</summary>
    public static double MeanMotion(double a, double gm) => Math.Sqrt(gm / (a * a * a));

    /// <summary>Orbital period 2 pi sqrt(a^3 / GM), seconds. a in metres, gm in m^3/s^2.</summary>
    public static double Period(double a, double gm) => TwoPi / MeanMotion(a, gm);

    /// <summary>
    /// Two-body inertial position (m) and velocity (m/s) at <paramref name="tSeconds"/> after the start,
    /// with M = M0 + n t, and the eccentric anomaly E (radians, continuous in t) used by relativity terms.
    /// </summary>
    public static void StateInertial(
        in KeplerElements el, double tSeconds, double gm,
        out Vec3 position, out Vec3 velocity, out double eccentricAnomalyRad)
    {
        OrbitGeometry geometry = OrbitGeometry.From(el, gm);
        geometry.State(tSeconds, out position, out velocity, out eccentricAnomalyRad);
    }
}

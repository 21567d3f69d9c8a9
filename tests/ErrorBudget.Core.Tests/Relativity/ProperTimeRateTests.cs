using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Relativity;

namespace ErrorBudget.Core.Tests.Relativity;

public class ProperTimeRateTests
{
    private const double Gm = PhysicalConstants.GpsGravitationalParameter;

    [Fact]
    public void Time_average_over_an_eccentric_orbit_is_the_net_secular_rate()
    {
        // Derived (SecularRate doc): <GM/r> = GM/a and <v^2> = GM/a in time, so <y> = L_G - 3GM/(2 a c^2) for any e.
        // Rectangle rule on a smooth periodic integrand converges geometrically; 4096 steps are exact to rounding
        // (~1e-25), and the periodic part is up to ~1e-9 for e = 0.7, so 1e-20 is a real test.
        const double absoluteTolerance = 1e-20;
        const int n = 4096;
        foreach (double e in new[] { 0.0, 0.01, 0.3, 0.7 })
        {
            var el = new KeplerElements(26_561_750, e, 0.96, 1.0, 0.5, 0.0);
            double period = Kepler.Period(el.SemiMajorAxisMeters, Gm);
            double sum = 0;
            for (int i = 0; i < n; i++)
            {
                Kepler.StateInertial(el, i * period / n, Gm, out Vec3 r, out Vec3 v, out _);
                sum += ProperTimeRate.Fractional(r, v, Gm);
            }

            Assert.Equal(SecularRate.Net(el.SemiMajorAxisMeters, Gm), sum / n, absoluteTolerance);
        }
    }

    [Fact]
    public void Integrated_periodic_rate_is_the_eccentricity_term_with_its_sign()
    {
        // Derived: Int_0^t (y - <y>) dt = (2GM/c^2) Int (1/a - 1/r) dt = -2 sqrt(GM a) e sin E / c^2 = F e sqrt(a) sin E,
        // starting at perigee (E = 0). This is how far the clock reads ahead, the sign IS-GPS-200 20.3.3.3.3.1 adds to
        // the clock correction. Simpson's rule with 30 s panels: error ~ h^4 max|y''''| T / 180 ~ 1e-20 s, far below
        // 1e-6 of the amplitude (2e-14 s at e = 0.01).
        const double relativeTolerance = 1e-6;
        const double h = 30;
        foreach (double e in new[] { 0.01, 0.2 })
        {
            var el = new KeplerElements(26_561_750, e, 0.96, 1.0, 0.5, 0.0);
            double net = SecularRate.Net(el.SemiMajorAxisMeters, Gm);
            double amplitude = EccentricityTerm.AmplitudeSeconds(e, el.SemiMajorAxisMeters);
            double period = Kepler.Period(el.SemiMajorAxisMeters, Gm);
            double offset = 0;
            int steps = (int)(period / h);
            for (int k = 0; k < steps; k++)
            {
                double t0 = k * h;
                offset += h / 6 * (Periodic(el, t0, net) + 4 * Periodic(el, t0 + h / 2, net) + Periodic(el, t0 + h, net));
                if (k % 50 == 49)
                {
                    Kepler.StateInertial(el, t0 + h, Gm, out _, out _, out double bigE);
                    double expected = EccentricityTerm.Seconds(e, el.SemiMajorAxisMeters, bigE);
                    Assert.Equal(0.0, (offset - expected) / amplitude, relativeTolerance);
                }
            }
        }
    }

    private static double Periodic(in KeplerElements el, double t, double net)
    {
        Kepler.StateInertial(el, t, Gm, out Vec3 r, out Vec3 v, out _);
        return ProperTimeRate.Fractional(r, v, Gm) - net;
    }

    [Fact]
    public void Circular_orbit_rate_is_constant_and_equals_the_net_rate()
    {
        // Derived: r = a and v^2 = GM/a on a circle, so y = L_G - 3GM/(2 a c^2) at every instant.
        const double absoluteTolerance = 1e-22;
        var el = new KeplerElements(26_561_750, 0, 0.96, 1.0, 0.5, 0.0);
        for (int i = 0; i < 10; i++)
        {
            Kepler.StateInertial(el, i * 3333.0, Gm, out Vec3 r, out Vec3 v, out _);
            Assert.Equal(SecularRate.Net(el.SemiMajorAxisMeters, Gm), ProperTimeRate.Fractional(r, v, Gm), absoluteTolerance);
        }
    }
}

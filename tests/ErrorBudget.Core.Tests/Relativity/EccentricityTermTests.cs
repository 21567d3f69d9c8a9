using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Relativity;

namespace ErrorBudget.Core.Tests.Relativity;

public class EccentricityTermTests
{
    // The state form equals F e sqrt(A) sin E only for orbits propagated with the GM inside F.
    private const double Gm = PhysicalConstants.GpsGravitationalParameter;
    private const double C = PhysicalConstants.SpeedOfLight;

    [Fact]
    public void Amplitude_for_e_0_01_at_26560_km_is_22_9_ns_or_6_86_m()
    {
        // REFERENCE-VALUES 1.2 magnitudes (derived) and suggested check 5: e = 0.01 -> 22.9 ns, 6.86 m peak.
        const double toleranceNs = 0.1;
        const double toleranceMeters = 0.05;
        double amplitude = EccentricityTerm.AmplitudeSeconds(0.01, 26_560_000);
        Assert.Equal(22.9, amplitude * 1e9, toleranceNs);
        Assert.Equal(6.86, amplitude * C, toleranceMeters);
    }

    [Fact]
    public void Amplitude_for_e_0_02_is_45_8_ns_and_is_reached_at_E_90_degrees()
    {
        // REFERENCE-VALUES 1.2 and suggested check 4: e = 0.02, sqrt(A) = 5153.8, sin E = 1 -> |Delta t_r| = 45.8 ns.
        const double toleranceNs = 0.1;
        Assert.Equal(45.8, EccentricityTerm.AmplitudeSeconds(0.02, 26_560_000) * 1e9, toleranceNs);
        Assert.Equal(-45.8, EccentricityTerm.Seconds(0.02, 5153.8 * 5153.8, Math.PI / 2) * 1e9, toleranceNs);
        // Derived: F < 0, so the term is negative on the way out from perigee (0 < E < pi).
        Assert.True(EccentricityTerm.Seconds(0.02, 26_560_000, 1.0) < 0);
    }

    [Fact]
    public void Broadcast_form_equals_minus_two_r_dot_v_over_c_squared_along_kepler_orbits()
    {
        // IS-GPS-200 20.3.3.3.3.1 and its state form -2 r.v/c^2 (REFERENCE-VALUES 1.2, suggested check 4), rel 1e-6.
        const double relativeTolerance = 1e-6;
        foreach (var el in new[]
        {
            new KeplerElements(26_560_000, 0.01, 0.96, 1.0, 0.5, 0.3),
            new KeplerElements(26_560_000, 0.02, 0.96, 4.0, 2.5, 1.3),
            new KeplerElements(42_164_000, 0.3, 0.2, 2.0, 5.0, 0.0),
        })
        {
            double period = Kepler.Period(el.SemiMajorAxisMeters, Gm);
            double amplitude = EccentricityTerm.AmplitudeSeconds(el.Eccentricity, el.SemiMajorAxisMeters);
            for (int i = 0; i < 97; i++)
            {
                Kepler.StateInertial(el, i * period / 97.0, Gm, out Vec3 r, out Vec3 v, out double bigE);
                double broadcast = EccentricityTerm.Seconds(el.Eccentricity, el.SemiMajorAxisMeters, bigE);
                // Relative to the amplitude: near sin E = 0 both forms vanish.
                Assert.Equal(0.0, (broadcast - EccentricityTerm.SecondsFromState(r, v)) / amplitude, relativeTolerance);
            }
        }
    }

    [Fact]
    public void State_form_is_the_same_with_ecef_position_and_ecef_velocity()
    {
        // Derived: v_ecef = R v_inertial - omega x r_ecef and r . (omega x r) = 0, so r.v does not change.
        const double relativeTolerance = 1e-9;
        const double omega = PhysicalConstants.GpsEarthRotationRate;
        var el = new KeplerElements(26_560_000, 0.015, 0.96, 1.0, 0.5, 0.3);
        Kepler.StateInertial(el, 5000, Gm, out Vec3 r, out Vec3 v, out _);
        double angle = 1.234;
        Vec3 rEcef = EarthRotation.InertialToEarthFixed(r, angle);
        Vec3 vEcef = EarthRotation.InertialToEarthFixed(v, angle) - new Vec3(-omega * rEcef.Y, omega * rEcef.X, 0);
        double inertial = EccentricityTerm.SecondsFromState(r, v);
        Assert.Equal(1.0, EccentricityTerm.SecondsFromState(rEcef, vEcef) / inertial, relativeTolerance);
    }

    [Fact]
    public void Term_has_zero_mean_over_an_orbit_sampled_uniformly_in_time()
    {
        // Derived: the time mean is (1/2pi) Int sin E dM = (1/2pi) Int sin E (1 - e cos E) dE = 0 (suggested check 5). Uniform
        // steps in mean anomaly are uniform in time; the rectangle rule is exact for this periodic integrand up to rounding.
        const double relativeTolerance = 1e-12;
        const int n = 1000;
        foreach (double e in new[] { 0.01, 0.3 })
        {
            double sum = 0;
            for (int i = 0; i < n; i++)
            {
                double bigE = Kepler.SolveEccentricAnomaly(2 * Math.PI * i / n + 0.1, e);
                sum += EccentricityTerm.Seconds(e, 26_560_000, bigE);
            }

            Assert.Equal(0.0, sum / n / EccentricityTerm.AmplitudeSeconds(e, 26_560_000), relativeTolerance);
        }
    }

    [Fact]
    public void Term_repeats_with_the_orbital_period_and_crosses_zero_twice_per_orbit()
    {
        // Suggested check 5: period = orbital period. Zero crossings at perigee and apogee only (sin E = 0).
        const double relativeTolerance = 1e-6;
        var el = new KeplerElements(26_560_000, 0.01, 0.96, 1.0, 0.5, 0.2);
        double period = Kepler.Period(el.SemiMajorAxisMeters, Gm);
        double amplitude = EccentricityTerm.AmplitudeSeconds(el.Eccentricity, el.SemiMajorAxisMeters);
        int crossings = 0;
        double previous = double.NaN;
        const int n = 720;
        for (int i = 0; i <= n; i++)
        {
            double t = i * period / n;
            Kepler.StateInertial(el, t, Gm, out _, out _, out double bigE);
            Kepler.StateInertial(el, t + period, Gm, out _, out _, out double bigELater);
            double now = EccentricityTerm.Seconds(el.Eccentricity, el.SemiMajorAxisMeters, bigE);
            Assert.Equal(0.0, (EccentricityTerm.Seconds(el.Eccentricity, el.SemiMajorAxisMeters, bigELater) - now) / amplitude, relativeTolerance);
            if (i > 0 && Math.Sign(now) != Math.Sign(previous))
            {
                crossings++;
            }

            previous = now;
        }

        Assert.Equal(2, crossings);
    }
}

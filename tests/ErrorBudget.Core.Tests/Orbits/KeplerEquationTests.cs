using ErrorBudget.Core.Orbits;

namespace ErrorBudget.Core.Tests.Orbits;

public class KeplerEquationTests
{
    private const double ResidualToleranceRad = 1e-12;

    public static TheoryData<double> Eccentricities => new() { 0.0, 1e-6, 0.003, 0.1, 0.5, 0.7, 0.85, 0.9 };

    [Theory]
    [MemberData(nameof(Eccentricities))]
    public void Solution_satisfies_keplers_equation_over_many_mean_anomalies(double e)
    {
        // Kepler's equation M = E - e sin E (two-body definition of the eccentric anomaly, common practice).
        for (int i = -400; i <= 400; i++)
        {
            double m = i * 0.0437; // about -17.5 .. 17.5 rad, several turns both ways
            double bigE = Kepler.SolveEccentricAnomaly(m, e);
            double residual = bigE - e * Math.Sin(bigE) - m;
            Assert.True(Math.Abs(residual) <= ResidualToleranceRad, $"M = {m}, e = {e}: residual {residual}");
        }
    }

    [Theory]
    [InlineData(1e-9)]
    [InlineData(-1e-9)]
    [InlineData(Math.PI)]
    [InlineData(-Math.PI)]
    [InlineData(Math.PI - 1e-9)]
    [InlineData(2 * Math.PI)]
    [InlineData(1000.0)]
    public void Hard_mean_anomalies_at_high_eccentricity_still_converge(double m)
    {
        // Same equation; near M = 0 with e = 0.9 the derivative 1 - e cos E is smallest (0.1), near pi the turn wraps.
        const double e = 0.9;
        double bigE = Kepler.SolveEccentricAnomaly(m, e);
        Assert.True(Math.Abs(bigE - e * Math.Sin(bigE) - m) <= ResidualToleranceRad, $"M = {m}: E = {bigE}");
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(1.234)]
    [InlineData(-5.0)]
    [InlineData(40.0)]
    public void Circular_orbit_gives_eccentric_anomaly_equal_to_mean_anomaly(double m)
    {
        // Derived: with e = 0 Kepler's equation is E = M.
        Assert.Equal(m, Kepler.SolveEccentricAnomaly(m, 0.0));
    }

    [Fact]
    public void Eccentric_anomaly_is_continuous_across_whole_turns()
    {
        // Convention stated on SolveEccentricAnomaly: whole turns of M are kept, so E(M + 2 pi) = E(M) + 2 pi.
        const double toleranceRad = 1e-12;
        double e0 = Kepler.SolveEccentricAnomaly(0.3, 0.6);
        double e1 = Kepler.SolveEccentricAnomaly(0.3 + 2 * Math.PI, 0.6);
        Assert.Equal(e0 + 2 * Math.PI, e1, toleranceRad);
    }

    [Theory]
    [InlineData(-0.1)]
    [InlineData(1.0)]
    [InlineData(double.NaN)]
    public void Eccentricity_outside_zero_to_one_is_rejected(double e)
    {
        // Elliptic orbits only (range stated on SolveEccentricAnomaly).
        Assert.Throws<ArgumentOutOfRangeException>(() => Kepler.SolveEccentricAnomaly(1.0, e));
    }
}

using ErrorBudget.Core.Geodesy;

namespace ErrorBudget.Core.Tests.Geodesy;

public class Wgs84Tests
{
    [Fact]
    public void Derived_semi_minor_axis_matches_the_published_value()
    {
        const double toleranceMeters = 1e-4;
        // NIMA TR8350.2, derived geometric constants: b = 6356752.3142 m.
        Assert.Equal(6356752.3142, Wgs84.SemiMinorAxisMeters, toleranceMeters);
    }

    [Fact]
    public void Derived_first_eccentricity_squared_matches_the_published_value()
    {
        const double tolerance = 1e-13;
        // NIMA TR8350.2, derived geometric constants: e^2 = 6.69437999014e-3.
        Assert.Equal(6.69437999014e-3, Wgs84.FirstEccentricitySquared, tolerance);
    }
}

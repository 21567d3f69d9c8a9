using ErrorBudget.Core.Geometry;

namespace ErrorBudget.Core.Tests.Geometry;

/// <summary>
/// DOPs of the exact closed-form geometries of REFERENCE-VALUES §9 (suggested check 22). The DOP
/// definitions are the standard ones (H = (GᵀG)⁻¹); each expected value is derived by hand from the
/// block-diagonal GᵀG written beside it.
/// </summary>
public class ClosedFormDopTests
{
    private const double DopTolerance = 1e-6;

    private static Dop SolveEqualWeights(params (double Az, double El)[] sky)
    {
        var los = GeometryFixtures.FromAzEl(sky);
        var (ok, _, _, dop) = GeometryFixtures.Solve(los, Enumerable.Repeat(1.0, los.Length).ToArray());
        Assert.True(ok);
        return dop;
    }

    private static void AssertDop(Dop expected, Dop actual)
    {
        Assert.Equal(expected.Gdop, actual.Gdop, DopTolerance);
        Assert.Equal(expected.Pdop, actual.Pdop, DopTolerance);
        Assert.Equal(expected.Hdop, actual.Hdop, DopTolerance);
        Assert.Equal(expected.Vdop, actual.Vdop, DopTolerance);
        Assert.Equal(expected.Tdop, actual.Tdop, DopTolerance);
    }

    [Fact]
    public void Zenith_plus_three_on_horizon_gives_closed_form_dops()
    {
        // REFERENCE-VALUES §9 row 1: GᵀG = diag(1.5, 1.5) ⊕ [[1, −1], [−1, 4]] (derived), inverse of the
        // (U, clock) block = [[4, 1], [1, 1]] / 3.
        Dop dop = SolveEqualWeights((0, 90), (0, 0), (120, 0), (240, 0));
        AssertDop(new Dop(Math.Sqrt(3), Math.Sqrt(8.0 / 3), Math.Sqrt(4.0 / 3), Math.Sqrt(4.0 / 3), Math.Sqrt(1.0 / 3)), dop);
    }

    [Fact]
    public void Regular_tetrahedron_gives_the_minimum_gdop_of_four_satellites()
    {
        // REFERENCE-VALUES §9 row 2: El = −asin(1/3); GᵀG = diag(4/3, 4/3, 4/3, 4) (derived: the four
        // lines of sight sum to zero), so H = diag(3/4, 3/4, 3/4, 1/4).
        double el = -Math.Asin(1.0 / 3.0) * 180.0 / Math.PI;
        Dop dop = SolveEqualWeights((0, 90), (0, el), (120, el), (240, el));
        AssertDop(new Dop(Math.Sqrt(2.5), 1.5, Math.Sqrt(1.5), Math.Sqrt(0.75), 0.5), dop);
    }

    [Fact]
    public void Zenith_plus_four_at_thirty_degrees_gives_closed_form_dops()
    {
        // REFERENCE-VALUES §9 row 3 (2.8868, 2.5166, 1.1547, 2.2361, 1.4142): GᵀG = diag(1.5, 1.5) ⊕
        // [[2, −3], [−3, 5]] (derived), whose (U, clock) inverse is [[5, 3], [3, 2]].
        Dop dop = SolveEqualWeights((0, 90), (0, 30), (90, 30), (180, 30), (270, 30));
        AssertDop(new Dop(Math.Sqrt(25.0 / 3), Math.Sqrt(19.0 / 3), Math.Sqrt(4.0 / 3), Math.Sqrt(5), Math.Sqrt(2)), dop);
    }

    [Fact]
    public void Zenith_plus_six_at_ten_degrees_gives_closed_form_dops()
    {
        // REFERENCE-VALUES §9 row 4 (1.6383, 1.5479, 0.8291, 1.3071, 0.5369). Derived: with c = cos 10°,
        // s = sin 10°, GᵀG = diag(3c², 3c²) ⊕ [[1 + 6s², −(1 + 6s)], [−(1 + 6s), 7]], determinant 6(1 − s)².
        double c = Math.Cos(10 * Math.PI / 180), s = Math.Sin(10 * Math.PI / 180);
        double det = 6 * (1 - s) * (1 - s);
        double h2 = 2.0 / (3 * c * c), v2 = 7.0 / det, t2 = (1 + (6 * s * s)) / det;
        Dop dop = SolveEqualWeights((0, 90), (0, 10), (60, 10), (120, 10), (180, 10), (240, 10), (300, 10));
        AssertDop(new Dop(Math.Sqrt(h2 + v2 + t2), Math.Sqrt(h2 + v2), Math.Sqrt(h2), Math.Sqrt(v2), Math.Sqrt(t2)), dop);

        // And the four printed decimals of the table.
        Assert.Equal(1.6383, dop.Gdop, 5e-5);
        Assert.Equal(0.5369, dop.Tdop, 5e-5);
    }
}

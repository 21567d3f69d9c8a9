using ErrorBudget.Core.Geometry;

namespace ErrorBudget.Core.Tests.Geometry;

/// <summary>Geometries and weights that cannot give a position (derived: rank of G or of GᵀWG below 4).</summary>
public class DegenerateGeometryTests
{
    private static double[] Ones(int m) => Enumerable.Repeat(1.0, m).ToArray();

    [Fact]
    public void Fewer_than_four_satellites_return_false()
    {
        var los = GeometryFixtures.FromAzEl((0, 90), (0, 10), (120, 10));
        Assert.False(GeometryFixtures.Solve(los, Ones(3)).Ok);
        Assert.False(GeometryFixtures.Solve([], []).Ok);
    }

    [Fact]
    public void Four_identical_lines_of_sight_return_false()
    {
        var los = GeometryFixtures.FromAzEl((45, 30), (45, 30), (45, 30), (45, 30));
        Assert.False(GeometryFixtures.Solve(los, Ones(4)).Ok);
    }

    [Fact]
    public void Satellites_all_at_one_elevation_return_false_because_up_and_clock_are_inseparable()
    {
        // The Up column is −sin El for every row, a multiple of the clock column.
        var los = GeometryFixtures.FromAzEl((0, 30), (60, 30), (130, 30), (200, 30), (290, 30));
        Assert.False(GeometryFixtures.Solve(los, Ones(5)).Ok);
    }

    [Fact]
    public void Lines_of_sight_in_one_vertical_plane_return_false()
    {
        // All in the North-Up plane: the East column of G is zero.
        var los = GeometryFixtures.FromAzEl((0, 10), (0, 50), (0, 90), (180, 40), (180, 15));
        Assert.False(GeometryFixtures.Solve(los, Ones(5)).Ok);
    }

    [Fact]
    public void Nearly_degenerate_geometry_beyond_the_gdop_limit_returns_false()
    {
        // Four satellites within 0.05° of each other: GDOP far above 1e4.
        var los = GeometryFixtures.FromAzEl((45, 30), (45.05, 30), (45, 30.05), (45.03, 30.02));
        Assert.False(GeometryFixtures.Solve(los, Ones(4)).Ok);
    }

    [Fact]
    public void Zero_weights_leaving_three_satellites_return_false()
    {
        var los = GeometryFixtures.FromAzEl((0, 90), (0, 10), (120, 10), (240, 10), (60, 45));
        Assert.True(GeometryFixtures.Solve(los, Ones(5)).Ok);
        Assert.False(GeometryFixtures.Solve(los, [1, 1, 0, 1, 0]).Ok);
    }

    [Fact]
    public void Negative_or_nan_weights_return_false()
    {
        var los = GeometryFixtures.FromAzEl((0, 90), (0, 10), (120, 10), (240, 10));
        Assert.False(GeometryFixtures.Solve(los, [1, 1, -1, 1]).Ok);
        Assert.False(GeometryFixtures.Solve(los, [1, double.NaN, 1, 1]).Ok);
    }

    [Fact]
    public void Mismatched_span_lengths_throw()
    {
        var los = GeometryFixtures.FromAzEl((0, 90), (0, 10), (120, 10), (240, 10));
        Assert.Throws<ArgumentException>(() => PositionSolution.TrySolve(los, Ones(3), new double[16], new double[16], out _));
        Assert.Throws<ArgumentOutOfRangeException>(() => PositionSolution.TrySolve(los, Ones(4), new double[15], new double[16], out _));
        Assert.Throws<ArgumentOutOfRangeException>(() => PositionSolution.TrySolve(los, Ones(4), new double[16], new double[15], out _));
    }
}

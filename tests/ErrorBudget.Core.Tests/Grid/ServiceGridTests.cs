using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Grid;

public sealed class ServiceGridTests
{
    private static GridSpec Spec(double latStep, double lonStep, double latMin = -90, double latMax = 90, double lonMin = -180, double lonMax = 180) =>
        new(latStep, lonStep, latMin, latMax, lonMin, lonMax, 0, 10);

    [Fact]
    public void A_global_five_degree_grid_has_36_by_72_cell_centres()
    {
        var grid = ServiceGrid.From(Spec(5, 5));
        Assert.Equal(36, grid.Rows);
        Assert.Equal(72, grid.Columns);
        Assert.Equal(2592, grid.Count);
        Assert.Equal(-87.5, grid.Cells[0].LatDeg, 12);
        Assert.Equal(-177.5, grid.Cells[0].LonDeg, 12);
        Assert.Equal(87.5, grid.Cells[^1].LatDeg, 12);
        Assert.Equal(177.5, grid.Cells[^1].LonDeg, 12);
    }

    [Fact]
    public void Area_weights_sum_to_one_and_follow_the_spherical_zone_areas()
    {
        var grid = ServiceGrid.From(Spec(10, 10));
        Assert.Equal(1.0, grid.Cells.Sum(c => c.AreaWeight), 12);

        // Zone area between latitudes on a sphere is proportional to sin(north) - sin(south) (Archimedes' hat-box theorem, common practice).
        double equator = grid.Cells.First(c => c.LatDeg == 5).AreaWeight;
        double polar = grid.Cells.First(c => c.LatDeg == 85).AreaWeight;
        double expectedRatio = (Math.Sin(90 * Math.PI / 180) - Math.Sin(80 * Math.PI / 180)) / Math.Sin(10 * Math.PI / 180);
        Assert.Equal(expectedRatio, polar / equator, 12);

        // The whole sphere is 4 pi: one 10 x 10 deg equatorial cell is sin(10 deg) * (10 deg in rad) / (4 pi).
        Assert.Equal(Math.Sin(10 * Math.PI / 180) * (10 * Math.PI / 180) / (4 * Math.PI), equator, 12);
    }

    [Fact]
    public void A_regional_area_places_users_inside_it_with_their_own_frames()
    {
        var grid = ServiceGrid.From(Spec(2, 4, latMin: 30, latMax: 40, lonMin: 170, lonMax: 190));
        Assert.Equal(5 * 5, grid.Count);
        Assert.All(grid.Cells, c => Assert.InRange(c.LatDeg, 30, 40));
        // 170..190 crosses the antimeridian: centres are reported in [-180, 180).
        Assert.Contains(grid.Cells, c => c.LonDeg < 0);
        Assert.All(grid.Cells, c => Assert.InRange(c.LonDeg, -180, 180));
        // Each user's Up vector points along its geodetic normal (Up . origin > 0 and unit length).
        Assert.All(grid.Cells, c => Assert.Equal(1.0, c.Frame.Up.Norm, 12));
    }
}

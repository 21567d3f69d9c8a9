using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Grid;

/// <summary>
/// The regular latitude/longitude grid of the service area, one user at each cell centre.
/// Area weights are the cells' shares of the area on the sphere, (sin lat_north - sin lat_south) x
/// delta_lon normalised to sum 1 (spherical approximation of the ellipsoid: common practice for
/// area weighting, error below 0.7 % between latitudes).
/// </summary>
public sealed class ServiceGrid
{
    private ServiceGrid(IReadOnlyList<GridCell> cells, int rows, int columns)
    {
        Cells = cells;
        Rows = rows;
        Columns = columns;
    }

    public IReadOnlyList<GridCell> Cells { get; }

    public int Rows { get; }

    public int Columns { get; }

    public int Count => Cells.Count;

    public static ServiceGrid From(GridSpec spec)
    {
        int rows = spec.Rows;
        int columns = spec.Columns;
        var cells = new GridCell[rows * columns];
        double total = 0;
        var raw = new double[rows];
        for (int r = 0; r < rows; r++)
        {
            double south = spec.LatMinDeg + r * spec.LatStepDeg;
            double north = south + spec.LatStepDeg;
            raw[r] = Math.Sin(north * Math.PI / 180) - Math.Sin(south * Math.PI / 180);
            total += raw[r] * columns;
        }

        for (int r = 0; r < rows; r++)
        {
            double lat = spec.LatMinDeg + (r + 0.5) * spec.LatStepDeg;
            for (int c = 0; c < columns; c++)
            {
                double lon = NormaliseLongitude(spec.LonMinDeg + (c + 0.5) * spec.LonStepDeg);
                int index = r * columns + c;
                var frame = EnuFrame.At(Geodetic.FromDegrees(lat, lon, spec.HeightMeters));
                cells[index] = new GridCell(index, lat, lon, raw[r] / total, frame);
            }
        }

        return new ServiceGrid(cells, rows, columns);
    }

    private static double NormaliseLongitude(double lonDeg)
    {
        double x = lonDeg % 360.0;
        if (x >= 180.0)
        {
            x -= 360.0;
        }
        else if (x < -180.0)
        {
            x += 360.0;
        }

        return x;
    }
}

using ErrorBudget.Core.Orbits;
using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Orbits;

public class WalkerConstellationTests
{
    private const double AngleToleranceDeg = 1e-9;

    private static ShellSpec Shell(string name, int t, int p, int f, double raanOffsetDeg = 10, double mOffsetDeg = 5) =>
        new(name, t, p, f, 55.0, 26_560_000, 0.01, 30.0, raanOffsetDeg, mOffsetDeg);

    private static double Deg(double rad) => rad * 180 / Math.PI;

    private static double WrapDeg(double deg) => ((deg % 360) + 360) % 360;

    [Fact]
    public void Walker_24_3_1_has_8_satellites_per_plane_and_planes_120_degrees_apart()
    {
        // Walker-delta T/P/F definition (common practice): S = T/P = 8, RAAN spacing 360/P = 120 deg.
        var c = Constellation.FromShells(new[] { Shell("meo", 24, 3, 1) });
        Assert.Equal(24, c.Count);
        for (int plane = 0; plane < 3; plane++)
        {
            Assert.Equal(8, c.Satellites.Count(s => s.Plane == plane));
            foreach (SatelliteInfo s in c.Satellites.Where(s => s.Plane == plane))
            {
                Assert.Equal(WrapDeg(10 + 120 * plane), Deg(s.Elements.RaanRad), AngleToleranceDeg);
            }
        }
    }

    [Fact]
    public void Walker_24_3_1_slots_are_45_degrees_apart_and_adjacent_planes_are_phased_by_F_360_over_T()
    {
        // Walker-delta definition (common practice): slot spacing 360/S = 45 deg; plane j+1 leads plane j by F 360/T = 15 deg.
        var c = Constellation.FromShells(new[] { Shell("meo", 24, 3, 1) });
        SatelliteInfo At(int plane, int slot) => c.Satellites.Single(s => s.Plane == plane && s.Slot == slot);
        for (int plane = 0; plane < 3; plane++)
        {
            for (int slot = 0; slot < 8; slot++)
            {
                double expected = WrapDeg(5 + slot * 45 + plane * 15);
                Assert.Equal(expected, Deg(At(plane, slot).Elements.MeanAnomalyAtStartRad), AngleToleranceDeg);
            }
        }

        double phase = WrapDeg(Deg(At(1, 0).Elements.MeanAnomalyAtStartRad - At(0, 0).Elements.MeanAnomalyAtStartRad));
        Assert.Equal(1 * 360.0 / 24, phase, AngleToleranceDeg);
    }

    [Fact]
    public void Shell_elements_are_copied_in_radians()
    {
        // Unit convention: scenario degrees, elements radians; a, e unchanged.
        var c = Constellation.FromShells(new[] { Shell("meo", 24, 3, 1) });
        KeplerElements el = c.Satellites[5].Elements;
        Assert.Equal(55.0, Deg(el.InclinationRad), AngleToleranceDeg);
        Assert.Equal(30.0, Deg(el.ArgumentOfPerigeeRad), AngleToleranceDeg);
        Assert.Equal(26_560_000, el.SemiMajorAxisMeters);
        Assert.Equal(0.01, el.Eccentricity);
    }

    [Fact]
    public void Satellites_are_indexed_shell_by_shell_plane_by_plane_slot_by_slot()
    {
        // Ordering contract of Constellation.FromShells.
        var c = Constellation.FromShells(new[] { Shell("meo", 6, 2, 1), Shell("geo", 3, 1, 0) });
        var expected = new[]
        {
            (0, "meo", 0, 0), (0, "meo", 0, 1), (0, "meo", 0, 2), (0, "meo", 1, 0), (0, "meo", 1, 1), (0, "meo", 1, 2),
            (1, "geo", 0, 0), (1, "geo", 0, 1), (1, "geo", 0, 2),
        };
        Assert.Equal(expected.Length, c.Count);
        for (int i = 0; i < c.Count; i++)
        {
            SatelliteInfo s = c.Satellites[i];
            Assert.Equal(i, s.Index);
            Assert.Equal(expected[i], (s.ShellIndex, s.ShellName, s.Plane, s.Slot));
        }
    }

    [Theory]
    [InlineData(24, 5)]
    [InlineData(0, 1)]
    [InlineData(4, 0)]
    public void Planes_that_do_not_divide_the_satellites_are_rejected(int t, int p)
    {
        // Walker-delta needs T a positive multiple of P.
        Assert.Throws<ArgumentException>(() => Constellation.FromShells(new[] { Shell("bad", t, p, 0) }));
    }
}

namespace ErrorBudget.Core.Tests.Geometry;

/// <summary>Identities that follow from the DOP definitions (derived from H = (GᵀG)⁻¹, sums of its diagonal).</summary>
public class DopIdentityTests
{
    private const double IdentityTolerance = 1e-9;

    [Fact]
    public void Pdop_squared_is_hdop_squared_plus_vdop_squared_and_gdop_squared_adds_tdop_squared()
    {
        var rng = new System.Random(20310601);
        for (int trial = 0; trial < 200; trial++)
        {
            int m = rng.Next(4, 13);
            var (ok, _, _, dop) = GeometryFixtures.Solve(GeometryFixtures.RandomSky(rng, m), GeometryFixtures.RandomWeights(rng, m));
            if (!ok)
            {
                continue; // a random draw of 4 may be nearly degenerate; that is tested elsewhere
            }

            Assert.Equal(dop.Pdop * dop.Pdop, (dop.Hdop * dop.Hdop) + (dop.Vdop * dop.Vdop), IdentityTolerance * dop.Pdop * dop.Pdop);
            Assert.Equal(dop.Gdop * dop.Gdop, (dop.Pdop * dop.Pdop) + (dop.Tdop * dop.Tdop), IdentityTolerance * dop.Gdop * dop.Gdop);
        }
    }

    [Fact]
    public void Dops_do_not_depend_on_the_weights()
    {
        // Derived: the DOPs are defined on the unweighted G, so any weights give the same DOPs.
        var rng = new System.Random(7);
        var los = GeometryFixtures.RandomSky(rng, 8);
        var a = GeometryFixtures.Solve(los, GeometryFixtures.RandomWeights(rng, 8));
        var b = GeometryFixtures.Solve(los, Enumerable.Repeat(1.0, 8).ToArray());
        Assert.True(a.Ok && b.Ok);
        Assert.Equal(b.Dop, a.Dop);
    }
}

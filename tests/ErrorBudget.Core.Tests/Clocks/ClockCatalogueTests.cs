using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Tests.Clocks;

public class ClockCatalogueTests
{
    private const double Fh = 0.5; // unused by the presets (h2 = h1 = 0)

    private static double Adev(string grade, double tau) => ClockCatalogue.Lookup(grade).Coefficients.AllanDeviation(tau, Fh);

    private static double Floor(string grade) => Math.Sqrt(2 * Math.Log(2) * ClockCatalogue.Lookup(grade).Coefficients.HMinus1);

    private static double MinimumAdev(string grade)
    {
        double min = double.PositiveInfinity;
        for (double tau = 1; tau <= 1e7; tau *= 1.1)
        {
            min = Math.Min(min, Adev(grade, tau));
        }

        return min;
    }

    [Fact]
    public void Passive_hydrogen_maser_meets_the_galileo_specification()
    {
        // Mattioni et al., 34th PTTI 2002: 1e-12 tau^-1/2 for 1 <= tau <= 1e4 s; REFERENCE-VALUES check 13, +-30 %.
        const double relTol = 0.30;
        Assert.InRange(Adev("passive-hydrogen-maser", 1), 1e-12 * (1 - relTol), 1e-12 * (1 + relTol));
        Assert.InRange(Adev("passive-hydrogen-maser", 1e4), 1e-14 * (1 - relTol), 1e-14 * (1 + relTol));

        // Berthoud et al. 2003: flicker floor 7e-15; factor-2 tolerance (check 13).
        Assert.InRange(Floor("passive-hydrogen-maser"), 7e-15 / 2, 7e-15 * 2);
        Assert.InRange(MinimumAdev("passive-hydrogen-maser"), 7e-15 / 2, 7e-15 * 2);
    }

    [Fact]
    public void Rubidium_meets_the_galileo_rafs_goals()
    {
        // Rochat et al. 1999: sigma_y(100 s) < 5e-13, flicker floor <= 5e-14 (factor-2 tolerance on the floor, check 13).
        Assert.True(Adev("rubidium", 100) <= 5e-13, $"{Adev("rubidium", 100)}");
        Assert.InRange(Floor("rubidium"), 5e-14 / 2, 5e-14);
        Assert.InRange(MinimumAdev("rubidium"), 5e-14 / 2, 5e-14 * 2);

        // GPS IIF-class Rb, from memory (REFERENCE-VALUES 2.5, status M): 1e-12..3e-12 at 1 s.
        Assert.InRange(Adev("rubidium", 1), 1e-12, 3e-12);
    }

    [Fact]
    public void Cesium_beam_matches_the_representative_levels()
    {
        // From memory (REFERENCE-VALUES 2.5, status M): ~1e-11 at 1 s, ~1e-13 at 1e4 s, 3e-14..1e-13 at one day; +-30 %.
        Assert.InRange(Adev("cesium-beam", 1), 0.7e-11, 1.3e-11);
        Assert.InRange(Adev("cesium-beam", 1e4), 0.7e-13, 1.3e-13);
        Assert.InRange(Adev("cesium-beam", 86400), 3e-14, 1e-13);
    }

    [Fact]
    public void Quartz_ocxo_is_about_1e_12_at_1_s_and_random_walk_dominated_later()
    {
        // From memory: short-term ~1e-12 at 1 s (+-30 %); beyond ~100 s sigma rises as tau^+1/2 (log-slope near +1/2).
        Assert.InRange(Adev("quartz-ocxo", 1), 0.7e-12, 1.3e-12);
        double slope = Math.Log(Adev("quartz-ocxo", 1e5) / Adev("quartz-ocxo", 1e4)) / Math.Log(10);
        Assert.InRange(slope, 0.45, 0.5);
    }

    [Fact]
    public void Every_grade_is_valid_has_a_source_and_is_found_by_name()
    {
        Assert.Contains("quartz-ocxo", ClockCatalogue.Names);
        Assert.Contains("rubidium", ClockCatalogue.Names);
        Assert.Contains("cesium-beam", ClockCatalogue.Names);
        Assert.Contains("passive-hydrogen-maser", ClockCatalogue.Names);
        foreach (var g in ClockCatalogue.All)
        {
            Assert.Empty(g.Coefficients.Validate());
            Assert.False(string.IsNullOrWhiteSpace(g.Source));
            Assert.Same(g, ClockCatalogue.Lookup(g.Name.ToUpperInvariant()));
        }
    }

    [Fact]
    public void White_fm_level_converts_to_h0_as_two_sigma_squared()
    {
        // Derived from sigma^2 = h0 / (2 tau): a 1e-12 tau^-1/2 spec gives h0 = 2e-24 s.
        Assert.Equal(2e-24, ClockCatalogue.Lookup("passive-hydrogen-maser").Coefficients.H0, 1e-36);
    }

    [Fact]
    public void Unknown_grade_names_itself_and_lists_the_known_ones()
    {
        var ex = Assert.Throws<ClockDefinitionException>(() => ClockCatalogue.Lookup("thorium"));
        Assert.Equal("grade", ex.Key);
        Assert.Contains("\"thorium\"", ex.Message, StringComparison.Ordinal);
        foreach (var name in ClockCatalogue.Names)
        {
            Assert.Contains(name, ex.Message, StringComparison.Ordinal);
        }
    }
}

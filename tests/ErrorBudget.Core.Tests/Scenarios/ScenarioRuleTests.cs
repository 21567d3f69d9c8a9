namespace ErrorBudget.Core.Tests.Scenarios;

public class ScenarioRuleTests
{
    [Fact]
    public void Planes_that_do_not_divide_the_satellites_name_both_keys()
    {
        var text = ScenarioText.With("planes = 3", "planes = 5");

        var error = ScenarioText.SingleError(text, "shell[1].planes", line: 8);

        Assert.Contains("shell[1].planes = 5 does not divide shell[1].satellites = 12", error.Message, StringComparison.Ordinal);
        Assert.Equal("a divisor of satellites = 12: 1, 2, 3, 4, 6, 12", error.Allowed);
    }

    [Fact]
    public void More_planes_than_satellites_is_rejected()
    {
        var text = ScenarioText.With("planes = 3", "planes = 24");

        var error = ScenarioText.SingleError(text, "shell[1].planes", line: 8);

        Assert.Contains("is more than shell[1].satellites = 12", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_phasing_not_below_the_plane_count_is_rejected()
    {
        var text = ScenarioText.With("phasing = 1", "phasing = 3");

        var error = ScenarioText.SingleError(text, "shell[1].phasing", line: 9);

        Assert.Equal("test.toml:9: shell[1].phasing = 3 is not below shell[1].planes = 3; allowed: integer 0 <= phasing <= 2", error.Message);
    }

    [Fact]
    public void A_latitude_step_larger_than_the_span_leaves_an_empty_grid()
    {
        var text = ScenarioText.With("lat_step_deg = 30", "lat_step_deg = 30\nlat_min_deg = 0\nlat_max_deg = 20");

        var error = ScenarioText.SingleError(text, "grid.lat_step_deg", line: 14);

        Assert.Contains("lat_step_deg = 30 is larger than the latitude span lat_max_deg - lat_min_deg = 20 deg, which leaves an empty grid", error.Message, StringComparison.Ordinal);
        Assert.Equal("0 < lat_step_deg <= 20", error.Allowed);
    }

    [Fact]
    public void A_longitude_step_larger_than_the_span_leaves_an_empty_grid()
    {
        var text = ScenarioText.With("lon_step_deg = 30", "lon_step_deg = 30\nlon_min_deg = 0\nlon_max_deg = 10");

        var error = ScenarioText.SingleError(text, "grid.lon_step_deg", line: 15);

        Assert.Contains("empty grid", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_southern_edge_north_of_the_northern_edge_is_rejected()
    {
        var text = ScenarioText.With("lat_step_deg = 30", "lat_step_deg = 30\nlat_min_deg = 40\nlat_max_deg = 10");

        var error = ScenarioText.SingleError(text, "grid.lat_max_deg", line: 16);

        Assert.Contains("grid.lat_max_deg = 10 with grid.lat_min_deg = 40 spans -30 deg", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_longitude_span_over_360_degrees_is_rejected()
    {
        var text = ScenarioText.With("lon_step_deg = 30", "lon_step_deg = 30\nlon_max_deg = 200");

        var error = ScenarioText.SingleError(text, "grid.lon_max_deg", line: 16);

        Assert.Equal("0 < lon_max_deg - lon_min_deg <= 360", error.Allowed);
    }

    [Fact]
    public void More_than_two_million_cells_are_rejected()
    {
        // 0.1 deg steps: 1800 x 3600 = 6,480,000 cells.
        var text = ScenarioText.With("lon_step_deg = 30", "lon_step_deg = 0.1");
        text = ScenarioText.With("lat_step_deg = 30", "lat_step_deg = 0.1", text);

        var error = ScenarioText.SingleError(text, "grid.lat_step_deg", line: 14);

        Assert.Contains("gives 1800 x 3600 = 6480000 cells", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_perigee_inside_the_earth_is_rejected()
    {
        var text = ScenarioText.With("semi_major_axis_km = 27600", "semi_major_axis_km = 6000");

        var error = ScenarioText.SingleError(text, "shell[1].semi_major_axis_km", line: 11);

        // 6000 km - 6378.137 km (WGS-84 a, REFERENCE-VALUES.md) = -378.137 km altitude.
        Assert.Contains("puts perigee a(1 - e) = 6000 km at -378.137 km altitude", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_eccentric_orbit_whose_perigee_dips_below_100_km_is_rejected()
    {
        // a(1 - e) = 12000 * 0.5 = 6000 km, below 6378.137 + 100 km (derived from the perigee formula).
        var text = ScenarioText.With("semi_major_axis_km = 27600", "semi_major_axis_km = 12000\neccentricity = 0.5");

        var error = ScenarioText.SingleError(text, "shell[1].semi_major_axis_km", line: 11);

        Assert.Contains("with shell[1].eccentricity = 0.5", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_step_longer_than_the_duration_is_rejected()
    {
        var text = ScenarioText.With("step_s = 600", "step_s = 9000");

        var error = ScenarioText.SingleError(text, "run.step_s", line: 4);

        Assert.Contains("is longer than run.duration_h = 2 (7200 s)", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void More_than_100000_epochs_are_rejected()
    {
        // 720 h at 1 s = 2,592,000 epochs.
        var text = ScenarioText.With("step_s = 600", "step_s = 1");
        text = ScenarioText.With("duration_h = 2", "duration_h = 720", text);

        var error = ScenarioText.SingleError(text, "run.step_s", line: 4);

        Assert.Contains("gives 2592000 epochs", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_rule_on_the_second_shell_names_shell_two()
    {
        var text = ScenarioText.Valid + "[[shell]]\nsatellites = 7\nplanes = 2\ninclination_deg = 55\nsemi_major_axis_km = 27600\n";

        ScenarioText.SingleError(text, "shell[2].planes", ScenarioText.LineOf(text, "planes = 2"));
    }

    [Fact]
    public void Several_problems_are_all_reported_at_once_in_line_order()
    {
        var text = ScenarioText.With("trials = 10", "trials = 0");
        text = ScenarioText.With("planes = 3", "planes = 5", text);
        text = ScenarioText.With("mask_deg = 10", "mask_deg = 95", text);
        text += "[user]\nmultipath = \"indoor\"\ncolour = \"blue\"\n[extra]\n";

        var errors = ScenarioText.Errors(text);

        Assert.Equal(
            ["run.trials", "shell[1].planes", "grid.mask_deg", "user.multipath", "user.colour", "extra"],
            errors.Select(e => e.Key));
        Assert.Equal([2, 8, 16, 18, 19, 20], errors.Select(e => e.Line));
    }
}

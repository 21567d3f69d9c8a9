namespace ErrorBudget.Cli.Tests;

/// <summary>Bad input: exit code 2, a message naming the key, and no output folder left behind.</summary>
public sealed class BadInputTests
{
    private const string Good = """
        [run]
        trials = 2
        duration_h = 1
        step_s = 1800

        [[shell]]
        satellites = 12
        planes = 3
        phasing = 1
        inclination_deg = 55
        semi_major_axis_km = 27600

        [grid]
        lat_step_deg = 45
        lon_step_deg = 90
        mask_deg = 10
        """;

    public static TheoryData<string, string, string> Cases => new()
    {
        { "malformed TOML", Good.Replace("trials = 2", "trials = = 2"), "run" },
        { "unknown key", Good.Replace("trials = 2", "trials = 2\ncolour = \"red\""), "colour" },
        { "negative sigma", Good + "\n[orbit]\nradial_sigma_m = -1\n", "radial_sigma_m" },
        { "mask at 90 deg", Good.Replace("mask_deg = 10", "mask_deg = 90"), "mask_deg" },
        { "zero step", Good.Replace("step_s = 1800", "step_s = 0"), "step_s" },
        { "zero trials", Good.Replace("trials = 2", "trials = 0"), "trials" },
        { "planes not dividing satellites", Good.Replace("planes = 3", "planes = 5"), "planes" },
        { "empty grid", Good.Replace("lat_step_deg = 45", "lat_step_deg = 45\nlat_min_deg = 0\nlat_max_deg = 10"), "lat_step_deg" },
        { "bad enum", Good + "\n[user]\nmultipath = \"sometimes\"\n", "multipath" },
        { "bad relativity mode (issue 4)", Good + "\n[relativity]\nsagnac = \"sometimes\"\n", "relativity.sagnac" },
        { "relativity factor out of range (issue 4)", Good + "\n[relativity]\nfrequency_offset_factor = 3\n", "relativity.frequency_offset_factor" },
        { "preset without its orbit (issue 4)", Good + "\n[relativity]\nfrequency_offset = \"preset\"\n", "relativity.frequency_offset" },
        { "unknown relativity key (issue 4)", Good + "\n[relativity]\nlorentz = 1\n", "relativity.lorentz" },
        { "unknown clock grade", Good + "\n[clock]\ngrade = \"sundial\"\n", "clock.grade" },
        { "negative clock coefficient", Good + "\n[clock]\ngrade = \"rubidium\"\nh_minus_1 = -1e-28\n", "clock.h_minus_1" },
        { "unfittable ADEV points", Good + "\n[clock]\ngrade = \"custom\"\nadev_tau_s = [1, 10, 100, 1000]\nadev_sigma = [1e-10, 1e-12, 1e-14, 1e-16]\n", "clock.adev_sigma" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public async Task A_bad_scenario_exits_2_names_the_key_and_writes_nothing(string what, string text, string key)
    {
        string root = CliRunner.NewTempFolder();
        string file = Path.Combine(root, "bad.toml");
        await File.WriteAllTextAsync(file, text);
        string outDir = Path.Combine(root, "out");

        var (code, _, err) = await CliRunner.RunAsync("run", file, "--out", outDir, "-q");

        Assert.True(code == 2, $"{what}: exit {code}, stderr: {err}");
        Assert.Contains(key, err);
        Assert.Contains("bad.toml", err);
        Assert.False(Directory.Exists(outDir), what);
        Assert.Single(Directory.EnumerateFileSystemEntries(root)); // only the scenario file: no temp folders either
    }

    [Fact]
    public async Task The_good_base_scenario_of_the_battery_runs()
    {
        string root = CliRunner.NewTempFolder();
        string file = Path.Combine(root, "good.toml");
        await File.WriteAllTextAsync(file, Good);
        var (code, _, err) = await CliRunner.RunAsync("run", file, "--out", Path.Combine(root, "out"), "-q");
        Assert.True(code == 0, err);
    }

    [Theory]
    [InlineData("--trials", "0", "--trials")]
    [InlineData("--threads", "0", "--threads")]
    [InlineData("--seed", "-4", "--seed")]
    public async Task Out_of_range_options_exit_2_with_the_allowed_range(string option, string value, string named)
    {
        string outDir = Path.Combine(CliRunner.NewTempFolder(), "out");
        var (code, _, err) = await CliRunner.RunAsync("run", CliRunner.ScenarioPath("smoke.toml"), "--out", outDir, option, value);
        Assert.Equal(2, code);
        Assert.Contains(named, err);
        Assert.Contains("allowed", err);
        Assert.False(Directory.Exists(outDir));
    }

    [Fact]
    public async Task A_missing_scenario_file_or_unknown_option_exits_2()
    {
        var (code, _, err) = await CliRunner.RunAsync("run", "/no/such/file.toml", "--out", Path.Combine(CliRunner.NewTempFolder(), "x"));
        Assert.Equal(2, code);
        Assert.Contains("file.toml", err);

        (code, _, err) = await CliRunner.RunAsync("run", CliRunner.ScenarioPath("smoke.toml"), "--bogus");
        Assert.Equal(2, code);
        Assert.Contains("--bogus", err);
    }

    [Fact]
    public void Exit_codes_are_the_documented_ones()
    {
        Assert.Equal(0, (int)ExitCode.Done);
        Assert.Equal(1, (int)ExitCode.Failure);
        Assert.Equal(2, (int)ExitCode.BadInput);
    }
}

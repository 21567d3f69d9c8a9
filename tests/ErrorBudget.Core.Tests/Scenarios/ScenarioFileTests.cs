using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Tests.Scenarios;

public class ScenarioFileTests
{
    private const double ExactTolerance = 0.0;

    [Fact]
    public void The_w1_benchmark_file_is_the_documented_workload()
    {
        var scenario = ScenarioLoader.LoadFile(ScenarioPath("w1.toml"));

        Assert.Equal(2592, scenario.Grid.Cells);        // 36 x 72 cell centres at 5 deg
        Assert.Equal(288, scenario.Run.Epochs);         // 24 h / 300 s
        Assert.Equal(30, scenario.TotalSatellites);     // Walker 30/5/1
        Assert.Equal(100, scenario.Run.Trials);
        var shell = Assert.Single(scenario.Shells);
        Assert.Equal((30, 5, 1), (shell.Satellites, shell.Planes, shell.Phasing));
        Assert.Equal(55.0, shell.InclinationDeg, ExactTolerance);
        Assert.Equal(27_600_000.0, shell.SemiMajorAxisMeters, ExactTolerance);
        Assert.Equal(0.0, shell.Eccentricity, ExactTolerance);
        Assert.Equal(10.0, scenario.Grid.MaskDeg, ExactTolerance);
        Assert.Equal(new ClockSpec(1.0, 0.0, 43_200.0), scenario.Clock);
        Assert.Equal(new OrbitErrorSpec(0.5, 2.0, 1.0), scenario.Orbit);
        var user = new UserEnvironmentSpec(IonosphereMode.SingleFrequency, 2.0, FrequencyPair.L1L5, 0.12, MultipathModel.Airborne, 0.36);
        Assert.Equal(user, scenario.User);
        Assert.Equal(new AssumedModelSpec(1.0, user), scenario.Assumed);
    }

    [Fact]
    public void The_demo_file_loads_with_two_shells()
    {
        var scenario = ScenarioLoader.LoadFile(ScenarioPath("demo.toml"));

        Assert.Equal(["aster", "lumen"], scenario.Shells.Select(s => s.Name));
        Assert.Equal(30, scenario.TotalSatellites);
        Assert.Equal(42_164_000.0, scenario.Shells[1].SemiMajorAxisMeters, ExactTolerance);
        Assert.Equal(288, scenario.Run.Epochs);         // 24 h / 300 s
        Assert.Equal(2592, scenario.Grid.Cells);
        Assert.Equal(IonosphereMode.DualFrequency, scenario.User.Ionosphere);
    }

    [Fact]
    public void The_relativity_demo_pair_differs_only_by_the_second_shell()
    {
        // Issue 4: the same mistake on one orbit radius and on two.
        var single = ScenarioLoader.LoadFile(ScenarioPath("relativity-single-shell.toml"));
        var two = ScenarioLoader.LoadFile(ScenarioPath("relativity-two-shells.toml"));

        Assert.Equal(single.Relativity, two.Relativity);
        Assert.Equal(FrequencyOffsetMode.Missed, single.Relativity.FrequencyOffset);
        Assert.Equal(GroundAbsorption.None, single.Relativity.GroundAbsorbs);
        Assert.Equal(single.Shells[0], two.Shells[0]);
        Assert.Equal(2, two.Shells.Count);
        Assert.NotEqual(single.Shells[0].SemiMajorAxisMeters, two.Shells[1].SemiMajorAxisMeters);
        Assert.Equal(single.Run, two.Run);
        Assert.Equal(single.Grid, two.Grid);
    }

    [Fact]
    public void The_smoke_file_is_small()
    {
        var scenario = ScenarioLoader.LoadFile(ScenarioPath("smoke.toml"));

        Assert.Equal(18, scenario.TotalSatellites);     // 12/3/1 + 6/3/1
        Assert.Equal(72, scenario.Grid.Cells);          // 6 x 12 at 30 deg
        Assert.Equal(12, scenario.Run.Epochs);          // 2 h / 600 s
        Assert.Equal(20, scenario.Run.Trials);
    }

    [Fact]
    public void A_loaded_file_keeps_its_path_and_text()
    {
        var path = ScenarioPath("smoke.toml");

        var scenario = ScenarioLoader.LoadFile(path);

        Assert.Equal(path, scenario.SourceName);
        Assert.Equal(File.ReadAllText(path), scenario.SourceText);
    }

    [Fact]
    public void A_missing_file_gives_a_clear_scenario_error()
    {
        var path = Path.Combine(AppContext.BaseDirectory, "no-such-scenario.toml");

        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadFile(path));

        var error = Assert.Single(exception.Errors);
        Assert.Equal(0, error.Line);
        Assert.Equal($"{path}: cannot read the scenario file (the file does not exist); allowed: the path of a readable TOML file", error.Message);
    }

    [Fact]
    public void A_folder_given_as_the_scenario_is_a_clear_scenario_error()
    {
        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadFile(AppContext.BaseDirectory));

        Assert.Contains("it is a folder, not a file", exception.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Errors_in_a_file_are_reported_with_its_path()
    {
        var path = Path.Combine(Path.GetTempPath(), $"errorbudget-scenario-{Guid.NewGuid():N}.toml");
        File.WriteAllText(path, ScenarioText.With("mask_deg = 10", "mask_deg = 95"));
        try
        {
            var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadFile(path));

            Assert.StartsWith($"{path}:16: grid.mask_deg = 95", exception.Message, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(path);
        }
    }

    /// <summary>scenarios/NAME in the repository: walk up from the test assembly to the folder holding ErrorBudget.sln.</summary>
    private static string ScenarioPath(string name)
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "ErrorBudget.sln")))
            {
                return Path.Combine(dir.FullName, "scenarios", name);
            }
        }

        throw new InvalidOperationException("ErrorBudget.sln not found above " + AppContext.BaseDirectory);
    }
}

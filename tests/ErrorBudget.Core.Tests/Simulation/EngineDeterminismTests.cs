using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Core.Tests.Simulation;

/// <summary>The counter-based random numbers make results independent of threads, tiles and trial blocks (DESIGN.md, Determinism).</summary>
public sealed class EngineDeterminismTests
{
    internal const string SmallScenario = """
        [run]
        seed = 11
        trials = 24
        duration_h = 2
        step_s = 900

        [[shell]]
        name = "inner"
        satellites = 12
        planes = 3
        phasing = 1
        inclination_deg = 55
        semi_major_axis_km = 27600

        [[shell]]
        name = "outer"
        satellites = 6
        planes = 2
        phasing = 1
        inclination_deg = 50
        semi_major_axis_km = 42164

        [grid]
        lat_step_deg = 20
        lon_step_deg = 30
        mask_deg = 5
        """;

    [Fact]
    public async Task Results_are_identical_for_any_thread_count_tile_size_and_trial_block()
    {
        var scenario = ScenarioLoader.Load(SmallScenario, "small.toml");
        var reference = await MonteCarloEngine.RunAsync(scenario, new RunOptions { Threads = 1, TileSize = 1000, TrialBlock = 4096 }, CancellationToken.None);
        var variants = new[]
        {
            new RunOptions { Threads = 2, TileSize = 7, TrialBlock = 4096 },
            new RunOptions { Threads = 2, TileSize = 1, TrialBlock = 5 },
            new RunOptions { Threads = 3, TileSize = 13, TrialBlock = 24 },
        };

        foreach (var options in variants)
        {
            var other = await MonteCarloEngine.RunAsync(scenario, options, CancellationToken.None);
            Assert.Equal(reference.Cells, other.Cells);
            Assert.Equal(reference.Epochs, other.Epochs);
            Assert.Equal(reference.Global, other.Global);
        }
    }

    [Fact]
    public async Task The_scalar_twin_of_the_hot_loop_gives_the_same_results()
    {
        var scenario = ScenarioLoader.Load(SmallScenario, "small.toml");
        var vector = await MonteCarloEngine.RunAsync(scenario, new RunOptions { UseSimd = true }, CancellationToken.None);
        var scalar = await MonteCarloEngine.RunAsync(scenario, new RunOptions { UseSimd = false }, CancellationToken.None);
        Assert.Equal(scalar.Cells, vector.Cells);
        Assert.Equal(scalar.Global, vector.Global);
    }

    [Fact]
    public async Task Every_cell_and_epoch_counts_all_its_samples()
    {
        var scenario = ScenarioLoader.Load(SmallScenario, "small.toml");
        var r = await MonteCarloEngine.RunAsync(scenario, new RunOptions { Threads = 2 }, CancellationToken.None);
        int epochs = scenario.Run.Epochs;
        Assert.Equal(8, epochs);
        Assert.Equal(scenario.Grid.Cells, r.Cells.Count);
        Assert.Equal(epochs, r.Epochs.Count);
        long expected = 0;
        foreach (var cell in r.Cells)
        {
            long availableEpochs = (long)Math.Round(epochs * (1 - cell.UnavailableFraction));
            Assert.Equal(availableEpochs * scenario.Run.Trials, cell.Samples);
            expected += cell.Samples;
        }

        Assert.Equal(expected, r.Global.Samples);
        Assert.Equal(expected, r.Epochs.Sum(e => e.Samples));
        Assert.Equal(1.0, r.Cells.Sum(c => c.AreaWeight), 12);
    }

    [Fact]
    public async Task A_different_seed_gives_different_errors()
    {
        var scenario = ScenarioLoader.Load(SmallScenario, "small.toml");
        var a = await MonteCarloEngine.RunAsync(scenario, new RunOptions(), CancellationToken.None);
        var b = await MonteCarloEngine.RunAsync(scenario with { Run = scenario.Run with { Seed = 12 } }, new RunOptions(), CancellationToken.None);
        Assert.NotEqual(a.Global.Vpe, b.Global.Vpe);
    }
}

using System.Collections.Concurrent;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Core.Tests.Simulation;

/// <summary>`--threads N` caps the whole run at N cores (a batch job's CPU budget, and the serial baseline of the speedup).</summary>
public sealed class EngineThreadCapTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public async Task The_tile_kernels_run_on_a_scheduler_of_exactly_the_requested_threads(int threads)
    {
        // The progress callback runs inside the kernel's task, so the scheduler it sees is the one the
        // whole pipeline shares; the default scheduler would report int.MaxValue here.
        var levels = new ConcurrentBag<int>();
        var scenario = ScenarioLoader.Load(EngineDeterminismTests.SmallScenario, "small.toml");
        var options = new RunOptions { Threads = threads, Progress = (_, _) => levels.Add(TaskScheduler.Current.MaximumConcurrencyLevel) };
        await MonteCarloEngine.RunAsync(scenario, options, CancellationToken.None);
        Assert.NotEmpty(levels);
        Assert.All(levels, level => Assert.Equal(threads, level));
    }
}

using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Core.Tests.Simulation;

/// <summary>
/// Issue 3, comparing grades on scenarios/demo.toml at its seed (trials cut to keep the test fast): a better clock never
/// gives a larger global VPE p95, a shorter upload interval never a larger clock range error. With one seed the random
/// numbers are shared by every variant (counter-based streams), so the comparisons are paired, not two noisy samples.
/// </summary>
public sealed class ClockGradeComparisonTests
{
    private const int Trials = 6;

    private static string DemoText()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "ErrorBudget.sln")))
            {
                return File.ReadAllText(Path.Combine(dir.FullName, "scenarios", "demo.toml"));
            }
        }

        throw new InvalidOperationException("ErrorBudget.sln not found above " + AppContext.BaseDirectory);
    }

    /// <summary>demo.toml with its [clock] table replaced by <paramref name="clock"/> and fewer trials.</summary>
    private static Scenario Demo(string clock)
    {
        string text = DemoText();
        int start = text.IndexOf("[clock]", StringComparison.Ordinal);
        int end = text.IndexOf("[orbit]", StringComparison.Ordinal);
        Assert.True(start > 0 && end > start, "test setup: demo.toml has [clock] before [orbit]");
        text = text[..start] + "[clock]\n" + clock + "\n\n" + text[end..];
        var scenario = ScenarioLoader.Load(text, "demo-variant.toml");
        return scenario with { Run = scenario.Run with { Trials = Trials } };
    }

    private static Task<RunResult> Run(Scenario scenario) =>
        MonteCarloEngine.RunAsync(scenario, new RunOptions { Threads = 2 }, CancellationToken.None);

    /// <summary>Pooled rms of the clock range error over every bin: sqrt(sum n rms^2 / sum n).</summary>
    private static double PooledClockRms(IReadOnlyList<AgeOfDataRow> rows) =>
        Math.Sqrt(rows.Where(r => r.Samples > 0).Sum(r => r.Samples * r.ClockRangeRmsMeters * r.ClockRangeRmsMeters) / rows.Sum(r => r.Samples));

    [Fact]
    public async Task A_better_clock_grade_never_gives_a_larger_global_vpe_p95()
    {
        // Ordered coefficient by coefficient (ClockCatalogue): the passive maser's h0, h-1, h-2 are all below the
        // rubidium's, and "rubidium x 16" multiplies all three by 16; the estimation errors are the same for all.
        var rb = ClockCatalogue.Lookup("rubidium").Coefficients;
        var phm = ClockCatalogue.Lookup("passive-hydrogen-maser").Coefficients;
        Assert.True(phm.H0 <= rb.H0 && phm.HMinus1 <= rb.HMinus1 && phm.HMinus2 <= rb.HMinus2, "test setup: grades not ordered");
        string worse = FormattableString.Invariant($"grade = \"rubidium\"\nh0 = {16 * rb.H0:R}\nh_minus_1 = {16 * rb.HMinus1:R}\nh_minus_2 = {16 * rb.HMinus2:R}");
        string[] bestToWorst = ["grade = \"passive-hydrogen-maser\"", "grade = \"rubidium\"", worse];

        var vpe = new List<double>();
        var clockRms = new List<double>();
        foreach (var clock in bestToWorst)
        {
            var result = await Run(Demo(clock + "\nupload_interval_h = 12"));
            vpe.Add(result.Global.Vpe.P95);
            clockRms.Add(PooledClockRms(result.AgeOfData));
        }

        for (int i = 1; i < vpe.Count; i++)
        {
            Assert.True(vpe[i] >= vpe[i - 1], $"VPE p95 {vpe[i]:F4} m of grade {i} below {vpe[i - 1]:F4} m of the better grade {i - 1}");
            Assert.True(clockRms[i] > clockRms[i - 1], $"clock rms {clockRms[i]:F4} m of grade {i} not above {clockRms[i - 1]:F4} m");
        }
    }

    [Fact]
    public async Task A_shorter_upload_interval_never_gives_a_larger_clock_range_error()
    {
        double[] hours = [3, 6, 12, 24];
        var rms = new List<double>();
        foreach (double h in hours)
        {
            var result = await Run(Demo(FormattableString.Invariant($"grade = \"rubidium\"\nupload_interval_h = {h}")));
            rms.Add(PooledClockRms(result.AgeOfData));
        }

        for (int i = 1; i < rms.Count; i++)
        {
            Assert.True(rms[i] >= rms[i - 1], $"clock rms {rms[i]:F4} m at {hours[i]} h below {rms[i - 1]:F4} m at {hours[i - 1]} h");
        }
    }

    [Fact]
    public async Task A_graded_run_reports_its_grade_adev_and_every_satellite_sample_by_age()
    {
        var scenario = Demo("grade = \"cesium-beam\"");
        var result = await Run(scenario);

        Assert.All(result.Clocks, r => Assert.Equal("cesium-beam", r.Grade));
        // tau = step x 2^k with 2^k <= epochs / 2 (demo.toml: 300 s steps, 288 epochs -> k = 0 .. 7).
        int octaves = (int)Math.Floor(Math.Log2(scenario.Run.Epochs / 2.0)) + 1;
        Assert.Equal(octaves, result.Clocks.Count);
        Assert.Equal((long)scenario.TotalSatellites * scenario.Run.Epochs * Trials, result.AgeOfData.Sum(r => r.Samples));
        foreach (var row in result.Clocks)
        {
            // The reference clocks honour the model (128 clocks, one point per epoch): within 15 % at every octave, the
            // largest tau included; derived from the white-FM edf 128 x 3 (N - 1)/(2m) >= 6000 at the largest m, i.e.
            // a 99.9 % interval of about +-5 %, doubled for the flicker share of the cesium beam.
            Assert.InRange(row.SimulatedAdev / row.ModelAdev, 0.85, 1.15);
        }
    }

    [Fact]
    public async Task The_simple_clock_writes_no_clock_rows_but_still_its_age_of_data()
    {
        var result = await Run(Demo("upload_sigma_m = 0.5\ngrowth_sigma_m_per_h = 0.2"));

        Assert.Empty(result.Clocks);
        var young = result.AgeOfData.First(r => r.Samples > 0);
        var old = result.AgeOfData.Last(r => r.Samples > 0);
        Assert.True(old.ClockRangeRmsMeters > young.ClockRangeRmsMeters, "growth with age of data");
    }

    [Fact]
    public async Task Graded_results_are_identical_for_any_thread_count_tile_size_and_trial_block()
    {
        var scenario = ScenarioLoader.Load(
            EngineDeterminismTests.SmallScenario + "\n[clock]\ngrade = \"rubidium\"\nupload_interval_h = 0.75\nupload_jitter_s = 120\n", "small-graded.toml");
        var reference = await MonteCarloEngine.RunAsync(scenario, new RunOptions { Threads = 1, TileSize = 1000, TrialBlock = 4096 }, CancellationToken.None);
        foreach (var options in new[] { new RunOptions { Threads = 2, TileSize = 7, TrialBlock = 5 }, new RunOptions { Threads = 3, TileSize = 13, TrialBlock = 24 } })
        {
            var other = await MonteCarloEngine.RunAsync(scenario, options, CancellationToken.None);
            Assert.Equal(reference.Cells, other.Cells);
            Assert.Equal(reference.Epochs, other.Epochs);
            Assert.Equal(reference.Global, other.Global);
            Assert.Equal(reference.Clocks, other.Clocks);
            Assert.Equal(reference.AgeOfData, other.AgeOfData); // exact: order-free sums and integer sketch counts
        }
    }
}

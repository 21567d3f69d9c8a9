using ErrorBudget.Core.Relativity;
using ErrorBudget.Core.Clocks;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Scenarios;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Tests.TestData;

/// <summary>A small hand-made run result: made-up values, NaN percentiles, one cell without samples.</summary>
internal static class SyntheticRun
{
    /// <summary>Above 2^53, so a seed passed through a double would lose its last digit.</summary>
    public const ulong Seed = 9_007_199_254_740_993UL;

    public const string ScenarioText = "# synthetic\n[run]\nseed = 9007199254740993\ntrials = 3\nname = \"Zürich – test\"\n";

    public static readonly DateTimeOffset Start = new(2031, 6, 1, 0, 0, 0, TimeSpan.Zero);

    public static Scenario Scenario()
    {
        var user = new UserEnvironmentSpec(IonosphereMode.DualFrequency, 0.0, FrequencyPair.L1L5, 0.05, MultipathModel.Airborne, 0.36);
        return new Scenario(
            new RunSettings(Seed, 3, Start, 900, 300),
            [
                new ShellSpec("meo", 24, 3, 1, 55, 27_600_000, 0.003, 0, 0, 0),
                new ShellSpec("geo", 3, 3, 0, 0, 42_164_000, 0, 0, 0, 0),
            ],
            new GridSpec(30, 60, -30, 30, 0, 180, 0, 10),
            new ClockSpec(0.5, 1e-5, 43_200),
            new OrbitErrorSpec(0.3, 1.5, 0.8),
            user,
            new AssumedModelSpec(1.0, user))
        {
            SourceText = ScenarioText,
            SourceName = "synthetic.toml",
        };
    }

    /// <summary>Six cells (2 x 3 grid); cell 4 has no samples (all figures NaN), cell 1 lacks the p99.9 tail.</summary>
    public static CellResult[] Cells() =>
    [
        new(0, -15, 30, 0.25, 9, 0.0, 8.5, 1.5, 2.25, 1.125, 1.75, new(1.25, 2.5, 3.75, double.NaN), new(2.0, 4.0, 6.0, double.NaN)),
        new(1, -15, 90, 0.25, 9, 1.0 / 9.0, 7.0, 1.625, 2.5, 1.25, 2.0, new(1.5, 3.0, double.NaN, double.NaN), new(2.5, 5.0, double.NaN, double.NaN)),
        new(2, -15, 150, 0.25, 9, 0.0, 9.25, 1.375, 2.0, 1.0, 1.5, new(1.0, 2.0, 3.0, double.NaN), new(1.75, 3.5, 5.25, double.NaN)),
        new(3, 15, 30, 0.25, 9, 0.0, 8.0, 1.5, 2.125, 1.0625, 1.625, new(1.125, 2.25, 3.5, double.NaN), new(2.125, 4.25, 6.5, double.NaN)),
        new(4, 15, 90, 0.25, 0, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN, PercentileSet.Empty, PercentileSet.Empty),
        new(5, 15, 150, 0.25, 9, 2.0 / 9.0, 6.5, 1.875, 3.0, 1.5, 2.5, new(1.75, 3.5, 5.0, double.NaN), new(3.0, 6.0, 9.0, double.NaN)),
    ];

    /// <summary>Three epochs, 300 s apart; the last one's instant is given with a +02:00 offset (written as UTC).</summary>
    public static EpochResult[] Epochs() =>
    [
        new(0, 0, Start, 18, 1.0 / 18.0, 8.0, 1.5, 2.5, new(1.25, 2.75, double.NaN, double.NaN), new(2.0, 5.0, double.NaN, double.NaN)),
        new(1, 300, Start.AddSeconds(300), 18, 0.0, 8.25, 1.5625, 2.375, new(1.375, 2.875, double.NaN, double.NaN), new(2.25, 5.5, double.NaN, double.NaN)),
        new(2, 600, new DateTimeOffset(2031, 6, 1, 2, 10, 0, TimeSpan.FromHours(2)), 18, 2.0 / 18.0, 7.75, 1.625, 2.625, PercentileSet.Empty, new(2.5, 6.0, double.NaN, double.NaN)),
    ];

    /// <summary>Three octaves of a rubidium-like grade at a 300 s step.</summary>
    public static ClockAdevRow[] Clocks() =>
    [
        new("rubidium", 0, 300, 1.25e-13, 1.3125e-13, 8, 4),
        new("rubidium", 1, 600, 9.375e-14, 8.75e-14, 8, 4),
        new("rubidium", 2, 1200, 7.5e-14, 6.25e-14, 8, 4),
    ];

    /// <summary>Three age bins; the last is empty (all figures NaN), the second too small for a p95.</summary>
    public static AgeOfDataRow[] AgeOfData() =>
    [
        new(0, 0, 14_400, 7_000, 40, 0.5, 0.875, 0.5625, 0.25, 0.375),
        new(1, 14_400, 28_800, 21_000, 12, 0.75, double.NaN, 0.6875, 0.25, double.NaN),
        new(2, 28_800, 43_200, double.NaN, 0, double.NaN, double.NaN, double.NaN, double.NaN, double.NaN),
    ];

    public static RunMetadata Metadata() => new(
        ScenarioHash: "3f2a9c0d4b5e6f708192a3b4c5d6e7f8091a2b3c4d5e6f708192a3b4c5d6e7f8",
        Seed: Seed,
        Trials: 3,
        ToolVersion: "0.1.0-test+abc123",
        Threads: 2,
        StartedUtc: new DateTimeOffset(2031, 6, 1, 12, 34, 56, TimeSpan.Zero),
        RunSeconds: 12.345678901234567);

    public static GlobalFigures Global() => new(
        Samples: 54,
        UnavailableFraction: 1.0 / 18.0,
        Hpe: new(1.3, 2.8, 4.1, double.NaN),
        Vpe: new(2.2, 5.1, 7.9, double.NaN),
        WorstHpe: new WorstCell(5, 15, 150, 3.5),
        WorstVpe: new WorstCell(-1, double.NaN, double.NaN, double.NaN));

    public static RunResult Result() => With(Cells(), Epochs());

    public static RunResult With(IReadOnlyList<CellResult> cells, IReadOnlyList<EpochResult> epochs) =>
        new(Scenario(), Metadata(), cells, epochs, Global())
        {
            Relativity = new RelativityReport(Relativity(), new RelativityPositionFigures(0, default, default, default), 3),
            Clocks = Clocks(),
            AgeOfData = AgeOfData(),
        };

    /// <summary>Three satellites: made-up statistics; the last one never seen by a sampled user (user-level figures NaN).</summary>
    public static RelativitySatelliteFigures[] Relativity() =>
    [
        new(0, "meo", 27_600_000, 0.003, -8.0e-11, 5.3e-10, 4.5e-10, 4.5e-10, 0.0, 6.9e-9, Stats(0, 0, 3), Stats(0, 0, 3), Stats(12.5, -20.0, 4), Stats(0.015, 0.0125, 4)),
        new(1, "meo", 27_600_000, 0.003, -8.0e-11, 5.3e-10, 4.5e-10, 0.0, 4.5e-10, 6.9e-9, Stats(-100, -250, 3), Stats(2.0, -3.0, 3), Stats(-3.0, 5.0, 2), Stats(0.016, 0.018, 2)),
        new(2, "geo", 42_164_000, 0.0, -5.2e-11, 5.9e-10, 5.4e-10, 5.4e-10, 0.0, 0.0, Stats(0, 0, 3), Stats(0, 0, 3), default, default),
    ];

    /// <summary>Statistics of <paramref name="count"/> values alternating between <paramref name="a"/> and <paramref name="b"/>.</summary>
    private static ErrorStatistics Stats(double a, double b, int count)
    {
        var s = default(ErrorStatistics);
        for (int i = 0; i < count; i++)
        {
            s.Add(i % 2 == 0 ? a : b);
        }

        return s;
    }
}

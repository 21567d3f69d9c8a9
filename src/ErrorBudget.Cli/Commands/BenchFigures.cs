using System.Text.Json.Serialization;

namespace ErrorBudget.Cli.Commands;

/// <summary>What `errorbudget bench --json` prints: one object a build server can track.</summary>
internal sealed record BenchFigures(
    [property: JsonPropertyName("workload")] string Workload,
    [property: JsonPropertyName("users")] long Users,
    [property: JsonPropertyName("epochs")] int Epochs,
    [property: JsonPropertyName("trials")] int Trials,
    [property: JsonPropertyName("user_solutions")] long UserSolutions,
    [property: JsonPropertyName("user_solutions_per_second")] double UserSolutionsPerSecond,
    [property: JsonPropertyName("simulation_seconds")] double SimulationSeconds,
    [property: JsonPropertyName("write_seconds")] double WriteSeconds,
    [property: JsonPropertyName("peak_memory_bytes")] long PeakMemoryBytes,
    [property: JsonPropertyName("threads")] int Threads,
    [property: JsonPropertyName("processor_count")] int ProcessorCount,
    [property: JsonPropertyName("tool_version")] string ToolVersion,
    [property: JsonPropertyName("araim_evaluate_us_per_user_epoch")] double AraimEvaluateMicroseconds,
    [property: JsonPropertyName("araim_test_us_per_trial")] double AraimTestMicroseconds,
    [property: JsonPropertyName("parallel_efficiency")] double? ParallelEfficiency,
    [property: JsonPropertyName("parallel_efficiency_by_round")] IReadOnlyList<double> EfficiencyByRound,
    [property: JsonPropertyName("warm_user_solutions_per_second")] double WarmUserSolutionsPerSecond,
    [property: JsonPropertyName("stage_seconds")] BenchStages Stages);

/// <summary>Thread seconds per stage of the timed run (summed over workers), and the writing time.</summary>
internal sealed record BenchStages(
    [property: JsonPropertyName("satellite_errors")] double SatelliteErrors,
    [property: JsonPropertyName("geometry")] double Geometry,
    [property: JsonPropertyName("user_normals")] double UserNormals,
    [property: JsonPropertyName("projection")] double Projection,
    [property: JsonPropertyName("sketches")] double Sketches,
    [property: JsonPropertyName("integrity")] double Integrity,
    [property: JsonPropertyName("writing")] double Writing,
    [property: JsonPropertyName("timed_run_wall_seconds")] double WallSeconds)
{
    public static BenchStages From(Core.Simulation.StageTimes t, double wallSeconds, double writeSeconds) => new(
        t.SatelliteErrorsSeconds, t.GeometrySeconds, t.UserNormalsSeconds, t.ProjectionSeconds, t.SketchesSeconds, t.IntegritySeconds, writeSeconds, wallSeconds);
}

[JsonSerializable(typeof(BenchFigures))]
[JsonSerializable(typeof(BenchStages))]
[JsonSerializable(typeof(IReadOnlyList<double>))]
internal sealed partial class BenchJson : JsonSerializerContext;

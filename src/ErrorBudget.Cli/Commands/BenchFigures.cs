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
    [property: JsonPropertyName("araim_test_us_per_trial")] double AraimTestMicroseconds);

[JsonSerializable(typeof(BenchFigures))]
internal sealed partial class BenchJson : JsonSerializerContext;

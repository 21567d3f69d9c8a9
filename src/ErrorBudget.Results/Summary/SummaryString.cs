using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Summary;

/// <summary>A JSON string member.</summary>
/// <param name="Format">JSON Schema format annotation (e.g. "date-time"), or null.</param>
/// <param name="Get">Value from the run.</param>
internal sealed record SummaryString(string Name, string Description, string? Format, Func<RunResult, string> Get)
    : SummaryField(Name, Description);

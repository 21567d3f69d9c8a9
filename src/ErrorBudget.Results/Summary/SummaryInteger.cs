using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Summary;

/// <summary>A JSON integer member.</summary>
/// <param name="Unit">Unit symbol ("1" for counts).</param>
/// <param name="Get">Value from the run.</param>
/// <param name="Minimum">Smallest valid value, or null.</param>
internal sealed record SummaryInteger(string Name, string Description, string Unit, Func<RunResult, long> Get, long? Minimum)
    : SummaryField(Name, Description);

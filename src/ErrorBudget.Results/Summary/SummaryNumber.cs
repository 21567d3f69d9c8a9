using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Summary;

/// <summary>A JSON number member; when <paramref name="Nullable"/>, NaN is written as null.</summary>
/// <param name="Unit">Unit symbol ("m", "deg", "s", "1").</param>
/// <param name="Nullable">True when the figure may be missing (NaN in the run result).</param>
/// <param name="Get">Value from the run.</param>
/// <param name="Minimum">Smallest valid value, or null.</param>
/// <param name="Maximum">Largest valid value, or null.</param>
internal sealed record SummaryNumber(string Name, string Description, string Unit, bool Nullable, Func<RunResult, double> Get, double? Minimum = null, double? Maximum = null)
    : SummaryField(Name, Description);

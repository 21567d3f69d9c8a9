using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Summary;

/// <summary>A JSON integer member that may exceed the signed 64-bit range (the seed).</summary>
internal sealed record SummaryUnsignedInteger(string Name, string Description, string Unit, Func<RunResult, ulong> Get)
    : SummaryField(Name, Description);

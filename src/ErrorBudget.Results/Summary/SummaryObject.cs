namespace ErrorBudget.Results.Summary;

/// <summary>A nested JSON object member.</summary>
internal sealed record SummaryObject(string Name, string Description, IReadOnlyList<SummaryField> Fields)
    : SummaryField(Name, Description);

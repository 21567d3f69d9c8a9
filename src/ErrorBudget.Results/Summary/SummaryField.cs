namespace ErrorBudget.Results.Summary;

/// <summary>
/// One member of summary.json. The writer and the JSON Schema document both walk the same tree
/// (<see cref="SummaryDefinition.Fields"/>), so they cannot drift apart.
/// </summary>
/// <param name="Name">Member name, snake_case.</param>
/// <param name="Description">What the value means.</param>
internal abstract record SummaryField(string Name, string Description);

namespace ErrorBudget.Core.Scenarios;

/// <summary>Every table of a scenario after validation, still in file units (km, h, deg).</summary>
internal sealed record ScenarioValues(
    SectionValues Run,
    IReadOnlyList<SectionValues> Shells,
    SectionValues Grid,
    SectionValues Clock,
    SectionValues Orbit,
    SectionValues User,
    SectionValues Assumed)
{
    /// <summary>[relativity] (defaults only when the table is left out).</summary>
    public SectionValues? Relativity { get; init; }

    /// <summary>[integrity] values, or null when the scenario has no such table.</summary>
    public SectionValues? Integrity { get; init; }

    /// <summary>[faults] values, or null when the scenario has no such table.</summary>
    public SectionValues? Faults { get; init; }
}

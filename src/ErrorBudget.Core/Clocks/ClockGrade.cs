namespace ErrorBudget.Core.Clocks;

/// <summary>A named clock grade of the <see cref="ClockCatalogue"/>.</summary>
/// <param name="Name">Generic trade name, e.g. "rubidium".</param>
/// <param name="Coefficients">Power-law noise coefficients (drift 0: the broadcast model is assumed to remove it).</param>
/// <param name="Source">Where the Allan deviation levels come from, and which are "from memory".</param>
public sealed record ClockGrade(string Name, PowerLawCoefficients Coefficients, string Source);

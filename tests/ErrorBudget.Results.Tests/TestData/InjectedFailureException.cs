namespace ErrorBudget.Results.Tests.TestData;

/// <summary>Thrown on purpose by a test input to fail a write partway.</summary>
internal sealed class InjectedFailureException() : Exception("Injected failure while writing.");

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// A validated scenario: everything a run needs, in SI units inside (metres, seconds, radians where
/// a property name says so; degrees only where the name ends in Deg). Built only by
/// <see cref="ScenarioLoader"/> or by tests; immutable.
/// </summary>
public sealed record Scenario(
    RunSettings Run,
    IReadOnlyList<ShellSpec> Shells,
    GridSpec Grid,
    ClockSpec Clock,
    OrbitErrorSpec Orbit,
    UserEnvironmentSpec User,
    AssumedModelSpec Assumed)
{
    /// <summary>The scenario file's text as the user wrote it (kept in every output's metadata).</summary>
    public string SourceText { get; init; } = "";

    /// <summary>The file name the scenario came from, for messages.</summary>
    public string SourceName { get; init; } = "scenario";

    /// <summary>[relativity]: which relativistic terms are applied (default: all, in full).</summary>
    public RelativitySpec Relativity { get; init; } = RelativitySpec.AllApplied;

    /// <summary>[integrity]: service, alert limits and protection-level algorithm; null without the table.</summary>
    public IntegritySpec? Integrity { get; init; }

    /// <summary>[faults]: injected truth faults; null without the table.</summary>
    public FaultSpec? Faults { get; init; }

    /// <summary>[run] batches: independent trial batches for the batch-means confidence intervals (1: none).</summary>
    public int Batches { get; init; } = 1;

    public int TotalSatellites => Shells.Sum(s => s.Satellites);
}

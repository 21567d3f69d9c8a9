namespace ErrorBudget.Results;

/// <summary>Key-value metadata keys written into every Parquet table of a result set.</summary>
public static class MetadataKeys
{
    /// <summary>The scenario file's text as the user wrote it.</summary>
    public const string Scenario = "errorbudget.scenario";

    /// <summary>SHA-256 of the scenario text, lower-case hex.</summary>
    public const string ScenarioHash = "errorbudget.scenario_hash";

    /// <summary>The seed used, decimal.</summary>
    public const string Seed = "errorbudget.seed";

    /// <summary>The trials run, decimal.</summary>
    public const string Trials = "errorbudget.trials";

    /// <summary>The tool's informational version.</summary>
    public const string ToolVersion = "errorbudget.tool_version";

    /// <summary>Name of the table's schema document in results-schema/ (e.g. "cells").</summary>
    public const string Schema = "errorbudget.schema";

    /// <summary><see cref="ResultSetLayout.SchemaVersion"/>, decimal.</summary>
    public const string SchemaVersion = "errorbudget.schema_version";

    /// <summary><see cref="ResultCaution.Text"/>.</summary>
    public const string Caution = "errorbudget.caution";
}

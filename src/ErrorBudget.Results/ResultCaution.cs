namespace ErrorBudget.Results;

/// <summary>The caution written into every table's metadata and the summary.</summary>
public static class ResultCaution
{
    public const string Text =
        "These results come from a simulation for design studies only: they certify nothing, and the "
        + "applicable standards, regulations and licensed professional practice take precedence over them.";
}

namespace ErrorBudget.Core;

/// <summary>The caution every report and result set carries.</summary>
public static class Caution
{
    public const string Text =
        "Results are for design studies only: they certify nothing, and the applicable standards, " +
        "local regulations and licensed practice take precedence.";
}

namespace ErrorBudget.Results;

/// <summary>The caution written into every table's metadata and the summary (the one text of <see cref="Core.Caution"/>).</summary>
public static class ResultCaution
{
    public const string Text = Core.Caution.Text;
}

using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Results.Tables;

/// <summary>The four nullable percentile columns of one error quantity (p50, p95, p99, p99.9), metres.</summary>
internal static class PercentileColumns
{
    /// <param name="prefix">"hpe" or "vpe".</param>
    /// <param name="quantity">What is measured, for the descriptions (e.g. "horizontal position error").</param>
    /// <param name="scope">Over what the percentile is taken, for the descriptions.</param>
    /// <param name="get">The row's percentile set.</param>
    public static IEnumerable<ColumnDefinition<TRow>> For<TRow>(string prefix, string quantity, string scope, Func<TRow, PercentileSet> get)
    {
        const string tail = " Null where too few samples stand behind the level (fewer than 1 / (1 - q)) or there are none.";
        yield return new DoubleColumn<TRow>($"{prefix}_p50_m", true, "m", $"Median {quantity} {scope}.{tail}", r => get(r).P50, minimum: 0);
        yield return new DoubleColumn<TRow>($"{prefix}_p95_m", true, "m", $"95th percentile of the {quantity} {scope}.{tail}", r => get(r).P95, minimum: 0);
        yield return new DoubleColumn<TRow>($"{prefix}_p99_m", true, "m", $"99th percentile of the {quantity} {scope}.{tail}", r => get(r).P99, minimum: 0);
        yield return new DoubleColumn<TRow>($"{prefix}_p999_m", true, "m", $"99.9th percentile of the {quantity} {scope}.{tail}", r => get(r).P999, minimum: 0);
    }
}

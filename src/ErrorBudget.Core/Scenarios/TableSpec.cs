namespace ErrorBudget.Core.Scenarios;

/// <summary>One scenario table and its keys.</summary>
/// <param name="Name">Table name as written in the header.</param>
/// <param name="IsArray">True for <c>[[name]]</c> (repeats), false for <c>[name]</c>.</param>
/// <param name="Required">The file must contain the table.</param>
/// <param name="Keys">Every key the table accepts.</param>
internal sealed record TableSpec(string Name, bool IsArray, bool Required, IReadOnlyList<KeySpec> Keys)
{
    public string Written => IsArray ? $"[[{Name}]]" : $"[{Name}]";

    public string KeyList => string.Join(", ", Keys.Select(k => k.Name));

    public KeySpec? Find(string key) => Keys.FirstOrDefault(k => k.Name == key);
}

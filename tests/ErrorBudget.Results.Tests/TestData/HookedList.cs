namespace ErrorBudget.Results.Tests.TestData;

/// <summary>A read-only list that runs a hook on every element access: injects failures or cancellation mid-write.</summary>
internal sealed class HookedList<T>(IReadOnlyList<T> inner, Action<int> onAccess) : IReadOnlyList<T>
{
    public T this[int index]
    {
        get
        {
            onAccess(index);
            return inner[index];
        }
    }

    public int Count => inner.Count;

    public IEnumerator<T> GetEnumerator()
    {
        for (int i = 0; i < inner.Count; i++)
        {
            yield return this[i];
        }
    }

    System.Collections.IEnumerator System.Collections.IEnumerable.GetEnumerator() => GetEnumerator();
}

namespace ErrorBudget.Core.Clocks;

/// <summary>
/// A clock definition that cannot be used: an unknown catalogue grade, a negative or non-finite noise
/// coefficient, or Allan deviation points that cannot be fitted. <see cref="Key"/> names the offending
/// input key (e.g. "h0", "grade", "adev") so the scenario layer can point at the line.
/// </summary>
public sealed class ClockDefinitionException : Exception
{
    public ClockDefinitionException(string key, string message)
        : base(message)
    {
        Key = key;
    }

    public ClockDefinitionException()
    {
        Key = string.Empty;
    }

    public ClockDefinitionException(string message)
        : base(message)
    {
        Key = string.Empty;
    }

    public ClockDefinitionException(string message, Exception innerException)
        : base(message, innerException)
    {
        Key = string.Empty;
    }

    /// <summary>The input key the problem belongs to ("h0", "h-1", "grade", "adev", ...).</summary>
    public string Key { get; }
}

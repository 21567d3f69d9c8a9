namespace ErrorBudget.Core.Scenarios;

/// <summary>The TOML value a scenario key takes.</summary>
internal enum KeyKind
{
    /// <summary>A TOML integer (a float such as 3.0 is rejected).</summary>
    Integer,

    /// <summary>A TOML float or integer, finite.</summary>
    Number,

    /// <summary>A string from a fixed set.</summary>
    Choice,

    /// <summary>An RFC 3339 instant with a UTC offset, as a string or a TOML offset date-time.</summary>
    Timestamp,

    /// <summary>A free, non-empty label.</summary>
    Text,

    /// <summary>A TOML array of finite numbers (integers or floats), each held to the key's range.</summary>
    NumberList,
}

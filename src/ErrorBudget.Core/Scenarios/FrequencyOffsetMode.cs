namespace ErrorBudget.Core.Scenarios;

/// <summary>How the secular relativistic frequency offset of each satellite clock is compensated ([relativity] frequency_offset).</summary>
public enum FrequencyOffsetMode
{
    /// <summary>Set for the satellite's own orbit: applied offset = factor x Net(actual a).</summary>
    Applied,

    /// <summary>Not compensated at all: applied offset = 0, the clock shows the full Net(a).</summary>
    Missed,

    /// <summary>Set for a nominal orbit: applied offset = factor x Net(preset a), whatever orbit the satellite flies.</summary>
    Preset,
}

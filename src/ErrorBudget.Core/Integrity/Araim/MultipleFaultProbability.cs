namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>
/// Running probability that two or more of a set of independent fault events occur, fed one event
/// prior at a time. Keeps P(none), P(exactly one) and P(two or more) by the recursion
/// P₂′ = P₂ + P₁·p, P₁′ = P₁·(1 − p) + P₀·p, P₀′ = P₀·(1 − p) (derived), which adds only non-negative
/// terms to P₂ and so avoids the cancellation of 1 − P₀ − P₁ for small priors. A value type: no allocation;
/// create it with <c>new()</c> (the default value has P(none) = 0).
/// </summary>
internal struct MultipleFaultProbability
{
    private double _none;
    private double _one;

    /// <summary>Starts with no events: P(none) = 1.</summary>
    public MultipleFaultProbability()
    {
        _none = 1.0;
    }

    /// <summary>P(two or more events), the prior of the multi-fault modes left unmonitored.</summary>
    public double TwoOrMore { get; private set; }

    /// <summary>Adds one independent event. Range: 0 ≤ p ≤ 1.</summary>
    public void Add(double p)
    {
        TwoOrMore += _one * p;
        _one = (_one * (1.0 - p)) + (_none * p);
        _none *= 1.0 - p;
    }
}

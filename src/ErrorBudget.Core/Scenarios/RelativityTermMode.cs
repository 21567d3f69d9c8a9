namespace ErrorBudget.Core.Scenarios;

/// <summary>Whether the user's algorithm applies a relativistic term ([relativity] eccentricity_term, sagnac, shapiro).</summary>
public enum RelativityTermMode
{
    /// <summary>Applied (in full, or by the table's factor where it has one).</summary>
    Applied,

    /// <summary>Left out: the whole term stays in the measured-minus-modelled range.</summary>
    Missed,
}

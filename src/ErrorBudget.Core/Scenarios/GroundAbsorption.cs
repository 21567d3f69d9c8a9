namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// What the ground segment's clock estimation absorbs of a constant residual rate y left by a missed or
/// mis-set frequency offset ([relativity] ground_absorbs). Range errors use the sign of
/// <see cref="Relativity.ClockRateError"/>: -c y T.
/// </summary>
public enum GroundAbsorption
{
    /// <summary>
    /// Each upload re-estimates the clock offset only (the broadcast rate stays as if the offset were right):
    /// the error restarts from zero at every upload and grows as -c y age, age = age of data.
    /// </summary>
    Offset,

    /// <summary>
    /// Each upload estimates offset and rate: a constant rate is fitted exactly, so it leaves no range error
    /// at all (zero, not a within-interval residual: the residual of a straight line fitted to a straight line).
    /// </summary>
    Rate,

    /// <summary>
    /// Nothing is re-estimated: every clock was synchronised at the scenario start and the error grows as
    /// -c y t with t the time since the start, the same for every satellite of equal y (the textbook case).
    /// </summary>
    None,
}

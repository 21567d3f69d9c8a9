namespace ErrorBudget.Core.Scenarios;

/// <summary>[run]: seed, trials and the simulated time span.</summary>
/// <param name="Seed">Master seed of every random draw. Range: 0 .. 2^63-1.</param>
/// <param name="Trials">Monte Carlo trials. Range: 1 .. 1,000,000.</param>
/// <param name="StartUtc">Scenario start instant (UTC); fixes the Earth rotation angle at t = 0.</param>
/// <param name="DurationSeconds">Simulated span. Range: (0, 30 days].</param>
/// <param name="StepSeconds">Epoch spacing. Range: [1 s, duration].</param>
public sealed record RunSettings(
    ulong Seed,
    int Trials,
    DateTimeOffset StartUtc,
    double DurationSeconds,
    double StepSeconds)
{
    /// <summary>Epochs at t = 0, step, 2 step, ... strictly before the end of the span.</summary>
    public int Epochs => (int)Math.Ceiling(DurationSeconds / StepSeconds - 1e-9);

    public double EpochTimeSeconds(int epoch) => epoch * StepSeconds;
}

namespace ErrorBudget.Core.Random;

/// <summary>
/// The purpose word of a random stream key (see <see cref="CounterRng.Key"/>). Each kind of random
/// quantity draws from its own family of streams, so adding draws to one model never shifts the
/// numbers of another. The numeric values are part of the reproducibility contract: never renumber.
/// </summary>
public enum RandomPurpose : ulong
{
    /// <summary>Satellite clock error states.</summary>
    SatelliteClock = 1,

    /// <summary>Satellite orbit error states (radial, along-track, cross-track).</summary>
    SatelliteOrbit = 2,

    /// <summary>User-local errors (ionosphere, troposphere, multipath, receiver noise).</summary>
    UserLocal = 3,

    /// <summary>Fault events (onset, magnitude).</summary>
    Fault = 4,

    /// <summary>Clock noise processes (power-law noise generators).</summary>
    ClockNoise = 5,

    /// <summary>Relativity-related random terms.</summary>
    Relativity = 6,

    /// <summary>Reserved for a future model.</summary>
    Spare = 7,

    /// <summary>Per-satellite user-level draws of the overbounding check (integrity).</summary>
    IntegrityCheck = 8,
}

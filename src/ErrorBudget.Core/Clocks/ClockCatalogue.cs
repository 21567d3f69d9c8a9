namespace ErrorBudget.Core.Clocks;

/// <summary>
/// Representative clock grades, built from Allan deviation levels by the IEEE Std 1139 relations:
/// white FM sigma(tau) = sigma1 tau^-1/2 gives h0 = 2 sigma1^2 (sigma1 at tau = 1 s);
/// a flicker floor F gives h-1 = F^2 / (2 ln 2); a random-walk level sigma_rw at tau_rw gives
/// h-2 = sigma_rw^2 / ((2 pi^2/3) tau_rw). White PM is left at 0 (it matters below ~1 s only).
/// Drift is 0 in every grade: the broadcast model is assumed to estimate it; add the unmodelled residual yourself.
/// </summary>
public static class ClockCatalogue
{
    /// <summary>Key used in <see cref="ClockDefinitionException"/> for an unknown grade.</summary>
    public const string Key = "grade";

    private const double Ln2 = 0.69314718055994530942;
    private const double Day = 86400.0;

    private static readonly ClockGrade[] Grades =
    [
        new("quartz-ocxo",
            Levels(whiteFmAt1s: 3e-13, flickerFloor: 1e-12, randomWalkSigma: 1e-12, randomWalkTauSeconds: 100),
            "Representative, from memory: flicker floor ~1e-12 from 1 s to ~100 s, white FM 3e-13 tau^-1/2, random-walk FM "
            + "reaching 1e-12 at 100 s and dominating beyond (sigma_y(1e4 s) ~ 1e-11); ageing drift not included."),
        new("rubidium",
            Levels(whiteFmAt1s: 2e-12, flickerFloor: 3e-14, randomWalkSigma: 1e-14, randomWalkTauSeconds: Day),
            "Galileo RAFS design goals (Rochat et al., 'Rubidium atomic clock for Galileo', 1999): sigma_y(100 s) < 5e-13 "
            + "(here 2e-13) and flicker floor <= 5e-14 (here 3e-14); white FM 2e-12 tau^-1/2 and random walk 1e-14 at one day "
            + "are GPS IIF-class on-orbit levels from memory (1e-12..3e-12 at 1 s)."),
        new("cesium-beam",
            Levels(whiteFmAt1s: 1e-11, flickerFloor: 5e-14, randomWalkSigma: 0, randomWalkTauSeconds: Day),
            "Representative spaceborne cesium beam, from memory: white FM 1e-11 tau^-1/2 (sigma_y(1e4 s) ~ 1.1e-13), "
            + "flicker floor 5e-14 (sigma_y(1 day) ~ 6e-14, inside the 3e-14..1e-13 usually quoted); no random walk."),
        new("passive-hydrogen-maser",
            Levels(whiteFmAt1s: 1e-12, flickerFloor: 7e-15, randomWalkSigma: 0, randomWalkTauSeconds: Day),
            "Galileo PHM specification 1e-12 tau^-1/2 for 1 s <= tau <= 1e4 s (Mattioni et al., 34th PTTI, 2002); "
            + "flicker floor 7e-15 from the engineering-model measurement (Berthoud et al., IEEE FCS/EFTF 2003); "
            + "drift (2e-14/day measured there) left to the broadcast model."),
        new("active-hydrogen-maser",
            Levels(whiteFmAt1s: 1e-13, flickerFloor: 7e-16, randomWalkSigma: 0, randomWalkTauSeconds: Day),
            "Representative ground active hydrogen maser, from memory: ~1e-13 at 1 s falling as tau^-1/2, flicker floor ~7e-16."),
    ];

    /// <summary>The known grade names, in catalogue order.</summary>
    public static IReadOnlyList<string> Names { get; } = Array.ConvertAll(Grades, g => g.Name);

    /// <summary>Every grade, in catalogue order.</summary>
    public static IReadOnlyList<ClockGrade> All { get; } = Array.AsReadOnly(Grades);

    /// <summary>
    /// The grade with this name (ordinal, case-insensitive). Throws <see cref="ClockDefinitionException"/> with key
    /// "grade" naming the unknown grade and listing the known ones.
    /// </summary>
    public static ClockGrade Lookup(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        foreach (var g in Grades)
        {
            if (string.Equals(g.Name, name, StringComparison.OrdinalIgnoreCase))
            {
                return g;
            }
        }

        throw new ClockDefinitionException(Key,
            $"{Key}: unknown clock grade \"{name}\"; known grades: {string.Join(", ", Names)}.");
    }

    private static PowerLawCoefficients Levels(double whiteFmAt1s, double flickerFloor, double randomWalkSigma, double randomWalkTauSeconds) =>
        new(
            H2: 0,
            H1: 0,
            H0: 2.0 * whiteFmAt1s * whiteFmAt1s,
            HMinus1: flickerFloor * flickerFloor / (2.0 * Ln2),
            HMinus2: randomWalkSigma * randomWalkSigma / (2.0 * Math.PI * Math.PI / 3.0 * randomWalkTauSeconds),
            DriftPerSecond: 0);
}

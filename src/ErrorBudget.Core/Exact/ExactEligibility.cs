using ErrorBudget.Core.Scenarios;

namespace ErrorBudget.Core.Exact;

/// <summary>
/// Whether a scenario's budget is Gaussian at every (epoch, user), so that the exact path applies: every
/// truth error is a Gaussian whose variance the geometry and the age of data fix, plus a known bias (a
/// relativistic term missed or mis-set, the same in every trial). Anything else needs sampling.
/// </summary>
public static class ExactEligibility
{
    /// <summary>Null when the exact path applies; otherwise why not, naming the scenario key.</summary>
    public static string? WhyNot(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        if (scenario.Faults is { IsActive: true })
        {
            return "[faults] injects non-Gaussian events; run without --exact";
        }

        if (scenario.Integrity is not null)
        {
            return "[integrity] needs the sampled errors (misleading-information counts, integrity diagram, overbounding); run without --exact";
        }

        if (scenario.Clock.IsGraded)
        {
            return "clock.grade simulates power-law clock noise; run without --exact";
        }

        if (scenario.Clock.UploadJitterSeconds > 0)
        {
            return "clock.upload_jitter_s makes the age of data random (a non-Gaussian mixture); run without --exact";
        }

        return null;
    }
}

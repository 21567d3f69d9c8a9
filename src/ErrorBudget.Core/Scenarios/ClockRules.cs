using ErrorBudget.Core.Clocks;

namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// [clock] rules across keys: which keys belong to the simple or the graded model, the Allan deviation points of a
/// custom grade (paired, ordered, fittable), and an upload jitter small enough to keep uploads in order.
/// </summary>
internal static class ClockRules
{
    /// <summary>Keys that only mean something with a grade.</summary>
    private static readonly string[] GradedKeys =
    [
        "h2", "h0", "h_minus_1", "h_minus_2", "drift_per_day", "adev_tau_s", "adev_sigma",
        "estimation_phase_sigma_ns", "estimation_frequency_sigma",
    ];

    /// <summary>Keys of the simple model, meaningless with a grade.</summary>
    private static readonly string[] SimpleKeys = ["upload_sigma_m", "growth_sigma_m_per_h"];

    private static readonly string[] CoefficientKeys = ["h2", "h0", "h_minus_1", "h_minus_2"];

    private const double SecondsPerHour = 3600.0;
    private const double SecondsPerDay = 86_400.0;

    public static void Check(SectionValues clock, SectionValues run, IReadOnlyList<SectionValues> shells, ScenarioErrorList errors)
    {
        CheckJitter(clock, shells, errors);
        if (clock.IsInvalid("grade"))
        {
            return;
        }

        if (!clock.Has("grade"))
        {
            foreach (var key in GradedKeys.Where(clock.Written))
            {
                clock.Fail(errors, key, "needs clock.grade", "set clock.grade (a catalogue grade or \"custom\") or leave the key out");
            }

            return;
        }

        foreach (var key in SimpleKeys.Where(clock.Written))
        {
            clock.Fail(errors, key, $"applies only to the simple clock model, not with {clock.Describe("grade")}",
                "leave it out; with a grade the upload error is estimation_phase_sigma_ns and estimation_frequency_sigma");
        }

        if (!CheckPoints(clock, errors))
        {
            return;
        }

        bool custom = clock.Text("grade") == ScenarioSchema.CustomGrade;
        bool hasPoints = clock.Has("adev_tau_s", "adev_sigma");
        if (custom && !hasPoints && !CoefficientKeys.Any(clock.Given))
        {
            clock.Fail(errors, "grade", "defines no clock",
                "with \"custom\", Allan deviation points (adev_tau_s and adev_sigma) or at least one of h2, h0, h_minus_1, h_minus_2");
            return;
        }

        if (hasPoints && run.Has("step_s"))
        {
            try
            {
                Resolve(clock, run.Number("step_s"));
            }
            catch (ClockDefinitionException e)
            {
                string why = e.Message.StartsWith(AllanDeviationFit.Key + ": ", StringComparison.Ordinal) ? e.Message[(AllanDeviationFit.Key.Length + 2)..] : e.Message;
                clock.Fail(errors, "adev_sigma", $"cannot be fitted ({why})",
                    "points that non-negative white PM, white FM, flicker FM and random-walk FM terms fit within 25 % rms (at least 4 points)");
            }
        }
    }

    /// <summary>
    /// The noise coefficients of a validated graded [clock]: the catalogue grade's (or zero for "custom"), replaced by the
    /// fit to the Allan deviation points when given (f_h = 1 / (2 step), the simulated band), then by each coefficient
    /// written; drift from drift_per_day. Throws <see cref="ClockDefinitionException"/> when the points cannot be fitted.
    /// </summary>
    public static (PowerLawCoefficients Noise, AllanDeviationPoint[]? Points, double? FitRms) Resolve(SectionValues clock, double stepSeconds)
    {
        string grade = clock.Text("grade");
        var c = grade == ScenarioSchema.CustomGrade ? default : ClockCatalogue.Lookup(grade).Coefficients;
        AllanDeviationPoint[]? points = null;
        double? rms = null;
        if (clock.Has("adev_tau_s", "adev_sigma"))
        {
            var tau = clock.Numbers("adev_tau_s");
            var sigma = clock.Numbers("adev_sigma");
            points = [.. tau.Select((t, i) => new AllanDeviationPoint(t, sigma[i]))];
            var fit = AllanDeviationFit.Fit(points, 0.5 / stepSeconds);
            c = fit.Coefficients;
            rms = fit.RelativeRmsResidual;
        }

        c = c with
        {
            H2 = clock.Has("h2") ? clock.Number("h2") : c.H2,
            H0 = clock.Has("h0") ? clock.Number("h0") : c.H0,
            HMinus1 = clock.Has("h_minus_1") ? clock.Number("h_minus_1") : c.HMinus1,
            HMinus2 = clock.Has("h_minus_2") ? clock.Number("h_minus_2") : c.HMinus2,
            DriftPerSecond = clock.Has("drift_per_day") ? clock.Number("drift_per_day") / SecondsPerDay : c.DriftPerSecond,
        };
        return (c, points, rms);
    }

    /// <summary>Both lists or neither, the same length, strictly increasing tau, only with "custom". False when a problem was reported.</summary>
    private static bool CheckPoints(SectionValues clock, ScenarioErrorList errors)
    {
        if (clock.IsInvalid("adev_tau_s") || clock.IsInvalid("adev_sigma"))
        {
            return false;
        }

        bool hasTau = clock.Has("adev_tau_s"), hasSigma = clock.Has("adev_sigma");
        if (hasTau != hasSigma)
        {
            var (given, missing) = hasTau ? ("adev_tau_s", "adev_sigma") : ("adev_sigma", "adev_tau_s");
            clock.Fail(errors, given, $"is given without clock.{missing}", "adev_tau_s and adev_sigma together, one sigma_y per tau");
            return false;
        }

        if (!hasTau)
        {
            return true;
        }

        if (clock.Text("grade") != ScenarioSchema.CustomGrade)
        {
            clock.Fail(errors, "adev_tau_s", $"defines a custom clock, but {clock.Describe("grade")}",
                "grade = \"custom\" with Allan deviation points; a catalogue grade takes only coefficient overrides");
            return false;
        }

        var tau = clock.Numbers("adev_tau_s");
        var sigma = clock.Numbers("adev_sigma");
        if (tau.Count != sigma.Count)
        {
            clock.Fail(errors, "adev_sigma", $"has {sigma.Count} items but {clock.Describe("adev_tau_s")} has {tau.Count}",
                "one sigma_y per tau");
            return false;
        }

        for (int i = 1; i < tau.Count; i++)
        {
            if (!(tau[i] > tau[i - 1]))
            {
                clock.Fail(errors, "adev_tau_s", $"is not strictly increasing at item {i + 1}", "tau values in increasing order, each once");
                return false;
            }
        }

        return true;
    }

    /// <summary>Jitter at most a tenth of the smallest upload interval in use, so uploads never swap order.</summary>
    private static void CheckJitter(SectionValues clock, IReadOnlyList<SectionValues> shells, ScenarioErrorList errors)
    {
        if (!clock.Has("upload_jitter_s", "upload_interval_h"))
        {
            return;
        }

        double hours = clock.Number("upload_interval_h");
        string owner = clock.Describe("upload_interval_h");
        foreach (var shell in shells.Where(s => s.Has("upload_interval_h") && s.Number("upload_interval_h") < hours))
        {
            hours = shell.Number("upload_interval_h");
            owner = shell.Describe("upload_interval_h");
        }

        double limit = ScenarioSchema.MaxJitterShareOfInterval * hours * SecondsPerHour;
        if (clock.Number("upload_jitter_s") > limit)
        {
            clock.Fail(errors, "upload_jitter_s", $"is more than a tenth of {owner}",
                $"0 <= upload_jitter_s <= {KeySpec.Format(limit)} (a tenth of the shortest upload interval, so uploads stay in order)");
        }
    }
}

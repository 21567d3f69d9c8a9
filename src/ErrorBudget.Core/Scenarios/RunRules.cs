namespace ErrorBudget.Core.Scenarios;

/// <summary>[run] rules across keys: the step fits the duration and the epoch count is bounded.</summary>
internal static class RunRules
{
    public static void Check(SectionValues run, ScenarioErrorList errors)
    {
        if (run.Has("batches", "trials") && run.Integer("batches") > run.Integer("trials"))
        {
            run.Fail(errors, "batches", $"is more than {run.Describe("trials")}", $"1 <= batches <= {run.Integer("trials")}");
        }

        if (!run.Has("duration_h", "step_s"))
        {
            return;
        }

        var durationSeconds = run.Number("duration_h") * 3600.0;
        var stepSeconds = run.Number("step_s");
        if (stepSeconds > durationSeconds)
        {
            run.Fail(errors, "step_s", $"is longer than {run.Describe("duration_h")} ({KeySpec.Format(durationSeconds)} s)",
                $"1 <= step_s <= {KeySpec.Format(durationSeconds)}");
            return;
        }

        // Same count as RunSettings.Epochs: t = 0, step, ... strictly before the end.
        var epochs = Math.Ceiling(durationSeconds / stepSeconds - 1e-9);
        if (epochs > ScenarioSchema.MaxEpochs)
        {
            run.Fail(errors, "step_s", $"gives {KeySpec.Format(epochs)} epochs over {run.Describe("duration_h")}",
                $"step_s >= {KeySpec.Format(durationSeconds / ScenarioSchema.MaxEpochs)} (at most {ScenarioSchema.MaxEpochs} epochs)");
        }
    }
}

using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// Fault-free false-alarm rate. Each vertical test fires with probability 2Q(K_fa,U) = P_FA_VERT/N and each
/// horizontal test with P_FA_HOR/(2N) (thresholds of REFERENCE-VALUES §5 with b_nom,acc = 0, errors drawn from
/// C_acc), so the rate lies between the largest single test, P_FA_VERT/N, and the union bound
/// P_FA_VERT + P_FA_HOR. The budgets are raised to 1e-2 so the rate is measurable with 20 000 samples;
/// tolerance: Clopper-Pearson at two-sided level 1 − 1e-4 (MathNet Beta).
/// </summary>
public class FalseAlarmTests
{
    private const double Alpha = 1e-4;
    private const int Samples = 20000;

    private static readonly AraimParameters Measurable = new() { PFalseAlarmVertical = 1e-2, PFalseAlarmHorizontal = 1e-2 };

    [Fact]
    public void Without_a_fault_the_false_alarm_rate_stays_within_the_continuity_budget()
    {
        var sky = AraimFixtures.TwoConstellations(new System.Random(8), 6, Measurable);
        var solver = new AraimSolver(12, Measurable);
        Assert.True(sky.Evaluate(solver, out AraimResult result));
        int n = result.FaultModes;
        Assert.Equal(14, n);

        ulong key = CounterRng.Key(1618, RandomPurpose.UserLocal, 1, 0, 0);
        int m = sky.Count, alarms = 0;
        var error = new double[m];
        var position = new double[3];
        for (int s = 0; s < Samples; s++)
        {
            CounterRng.FillNormals(key, (ulong)(s * m), error);
            for (int i = 0; i < m; i++)
            {
                error[i] *= Math.Sqrt(sky.AccuracyVariance[i]);
            }

            alarms += solver.Test(error, position).Detected ? 1 : 0;
        }

        var (low, high) = AraimFixtures.ClopperPearson(alarms, Samples, Alpha);
        double union = Measurable.PFalseAlarmVertical + Measurable.PFalseAlarmHorizontal;
        double single = Measurable.PFalseAlarmVertical / n;
        Assert.True(low <= union, $"false-alarm rate {alarms / (double)Samples:F5} exceeds the budget {union}");
        Assert.True(high >= single, $"false-alarm rate {alarms / (double)Samples:F5} below the single-test rate {single:F5}");
    }
}

using ErrorBudget.Core.Integrity.Araim;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>REFERENCE-VALUES suggested check 27: LPV-200 availability at VPL 35 m, HPL 40 m, EMT 15 m, σ_acc 1.87 m.</summary>
public class Lpv200CriteriaTests
{
    private static readonly AraimResult JustAvailable = new(
        HplMeters: 39.9, VplMeters: 34.9, SigmaAccuracyVerticalMeters: 1.86, EffectiveMonitorThresholdMeters: 14.9,
        FaultModes: 12, UnmonitorableModes: 0, UnmonitoredPrior: 1e-8, UnmonitoredWithinThreshold: true);

    [Fact]
    public void An_epoch_just_inside_every_limit_is_available()
    {
        Assert.True(Lpv200Criteria.IsAvailable(JustAvailable));
    }

    [Fact]
    public void Raising_any_one_figure_above_its_limit_makes_the_epoch_unavailable()
    {
        Assert.False(Lpv200Criteria.IsAvailable(JustAvailable with { VplMeters = 35.1 }));
        Assert.False(Lpv200Criteria.IsAvailable(JustAvailable with { HplMeters = 40.1 }));
        Assert.False(Lpv200Criteria.IsAvailable(JustAvailable with { EffectiveMonitorThresholdMeters = 15.1 }));
        Assert.False(Lpv200Criteria.IsAvailable(JustAvailable with { SigmaAccuracyVerticalMeters = 1.88 }));
        Assert.False(Lpv200Criteria.IsAvailable(JustAvailable with { UnmonitoredWithinThreshold = false }));
        Assert.False(Lpv200Criteria.IsAvailable(JustAvailable with { VplMeters = double.NaN }));
    }
}

using ErrorBudget.Core.Integrity;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// The presets against ICAO Annex 10, Vol. I, Table 3.7.2.4-1 as reproduced in Table 1 of "Advances in BeiDou
/// Navigation Satellite System (BDS) and satellite navigation augmentation technologies", Satellite Navigation
/// (2020), doi 10.1186/s43020-020-00010-2 (REFERENCE-VALUES §6, status V; suggested check 31). K factors:
/// RTCA DO-229 appendix J, from memory (REFERENCE-VALUES §4).
/// </summary>
public class ServiceLevelsTests
{
    public static TheoryData<string, double, double, double, double, double, string, double> Table => new()
    {
        // key, HAL, VAL, H acc 95 %, V acc 95 %, integrity risk, per, K_H (table row; K_H from DO-229)
        { "npa", 556, double.NaN, 220, double.NaN, 1e-7, "hour", 6.18 },
        { "apv-i", 40, 50, 16, 20, 2e-7, "approach", 6.0 },
        { "apv-ii", 40, 20, 16, 8, 2e-7, "approach", 6.0 },
        { "lpv-200", 40, 35, 16, 4, 2e-7, "approach", 6.0 },
    };

    [Theory]
    [MemberData(nameof(Table))]
    public void Each_preset_encodes_its_row_of_the_icao_table_exactly(
        string key, double hal, double val, double hAcc, double vAcc, double risk, string per, double kH)
    {
        Assert.True(ServiceLevels.TryGet(key, out var level));
        // Exact equality (no tolerance): the values are typed constants, NaN meaning "none" in the table.
        Assert.Equal(key, level.Name);
        Assert.Equal(hal, level.HorizontalAlertLimitMeters);
        Assert.Equal(val, level.VerticalAlertLimitMeters);
        Assert.Equal(hAcc, level.HorizontalAccuracy95Meters);
        Assert.Equal(vAcc, level.VerticalAccuracy95Meters);
        Assert.Equal(risk, level.IntegrityRisk);
        Assert.Equal(per, level.IntegrityRiskPer);
        Assert.Equal(kH, level.KHorizontal);
        Assert.Equal(5.33, level.KVertical);
    }

    [Fact]
    public void Keys_list_the_four_presets_in_table_order()
    {
        Assert.Equal(["npa", "apv-i", "apv-ii", "lpv-200"], ServiceLevels.Keys);
        foreach (string key in ServiceLevels.Keys)
        {
            Assert.True(ServiceLevels.TryGet(key, out _));
        }
    }

    [Fact]
    public void Lookup_ignores_case_and_reports_an_unknown_key()
    {
        Assert.True(ServiceLevels.TryGet("LPV-200", out var level));
        Assert.Equal("lpv-200", level.Name);
        Assert.False(ServiceLevels.TryGet("cat-iii", out var missing));
        Assert.Null(missing);
        Assert.Throws<ArgumentNullException>(() => ServiceLevels.TryGet(null!, out _));
    }

    [Fact]
    public void Custom_level_carries_the_given_alert_limits_and_approach_figures()
    {
        var level = ServiceLevels.Custom(25.0, 12.5);
        Assert.Equal(ServiceLevels.CustomName, level.Name);
        Assert.Equal(25.0, level.HorizontalAlertLimitMeters);
        Assert.Equal(12.5, level.VerticalAlertLimitMeters);
        Assert.True(double.IsNaN(level.HorizontalAccuracy95Meters) && double.IsNaN(level.VerticalAccuracy95Meters));
        Assert.Equal(2e-7, level.IntegrityRisk);
        Assert.Equal("approach", level.IntegrityRiskPer);
        Assert.Equal(6.0, level.KHorizontal);
        Assert.Equal(5.33, level.KVertical);
    }

    [Theory]
    [InlineData(0.0, 10.0, "halMeters")]
    [InlineData(-1.0, 10.0, "halMeters")]
    [InlineData(double.NaN, 10.0, "halMeters")]
    [InlineData(40.0, double.PositiveInfinity, "valMeters")]
    [InlineData(40.0, 0.0, "valMeters")]
    public void Custom_rejects_a_limit_that_is_not_positive_and_finite(double hal, double val, string parameter)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => ServiceLevels.Custom(hal, val));
        Assert.Equal(parameter, e.ParamName);
        Assert.Contains("(0, +inf)", e.Message, StringComparison.Ordinal);
    }
}

using ErrorBudget.Core.Integrity.Araim;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>Defaults and validation of <see cref="AraimParameters"/>.</summary>
public class AraimParametersTests
{
    [Fact]
    public void Defaults_are_the_baseline_allocations()
    {
        // WG-C ARAIM TSG ADD v3.0 (from memory, REFERENCE-VALUES §5); PHMI_VERT + PHMI_HOR = 1e-7 and
        // P_FA_VERT + P_FA_HOR = 3.99e-6 ≈ 4e-6 per approach are the totals of the same document.
        var p = new AraimParameters();
        Assert.Equal(9.8e-8, p.PhmiVertical);
        Assert.Equal(2e-9, p.PhmiHorizontal);
        Assert.Equal(1e-7, p.PhmiVertical + p.PhmiHorizontal, 1e-22);
        Assert.Equal(8e-8, p.PThres);
        Assert.Equal(3.9e-6, p.PFalseAlarmVertical);
        Assert.Equal(9e-8, p.PFalseAlarmHorizontal);
        Assert.Equal(0.05, p.TolPlMeters);
        Assert.Equal(1.96, p.KAcc);
        Assert.Equal(1e-5, p.PEmt);
        Assert.Equal(1e-5, p.PSat);
        Assert.Equal(1e-4, p.PConst);
        Assert.Equal(0.75, p.NominalBiasIntegrityMeters);
        Assert.Equal(0.0, p.NominalBiasAccuracyMeters);
        Assert.Equal(2.0 / 3.0, p.UreOverUra);
        Assert.Empty(p.Validate());
    }

    [Fact]
    public void Accuracy_variance_uses_two_thirds_of_sigma_ura()
    {
        var p = new AraimParameters();
        Assert.Equal(1.0 + 0.25, p.IntegrityVariance(1.0, 0.25), 1e-15);
        Assert.Equal((4.0 / 9.0) + 0.25, p.AccuracyVariance(1.0, 0.25), 1e-15);
    }

    [Fact]
    public void Validation_reports_every_out_of_range_value_by_name()
    {
        var p = new AraimParameters
        {
            PhmiVertical = 0.0,
            PhmiHorizontal = 1.0,
            PThres = -1e-9,
            PFalseAlarmVertical = double.NaN,
            PFalseAlarmHorizontal = 2.0,
            TolPlMeters = 0.0,
            KAcc = double.PositiveInfinity,
            PEmt = 1.5,
            PSat = 1.0,
            PConst = -0.1,
            NominalBiasIntegrityMeters = -0.75,
            NominalBiasAccuracyMeters = double.NaN,
            UreOverUra = -1.0,
            PExclusionTest = 0.0,
        };
        string[] expected =
        [
            "PhmiVertical", "PhmiHorizontal", "PThres", "PFalseAlarmVertical", "PFalseAlarmHorizontal", "TolPlMeters", "KAcc",
            "PEmt", "PSat", "PConst", "NominalBiasIntegrityMeters", "NominalBiasAccuracyMeters", "UreOverUra", "PExclusionTest",
        ];
        Assert.Equal(expected, p.Validate().Select(e => e.Name));
        Assert.Equal("PhmiVertical = 0 is out of range; allowed: 0 < PhmiVertical < 1", p.Validate()[0].Message);
    }

    [Fact]
    public void The_solver_refuses_invalid_parameters_naming_the_first_one()
    {
        var p = new AraimParameters { PSat = 1.2 };
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => new AraimSolver(8, p));
        Assert.Equal("PSat", e.ParamName);
        Assert.Throws<ArgumentOutOfRangeException>(() => new AraimSolver(3, new AraimParameters()));
    }
}

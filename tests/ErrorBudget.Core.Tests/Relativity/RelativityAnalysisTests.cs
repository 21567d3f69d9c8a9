using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Relativity;

namespace ErrorBudget.Core.Tests.Relativity;

/// <summary>The per-satellite rows behind relativity.parquet and `errorbudget check`.</summary>
public class RelativityAnalysisTests
{
    private const double C = PhysicalConstants.SpeedOfLight;
    private const double Gm = Wgs84.GravitationalParameter;
    private const double RoundingRelative = 1e-12;

    [Fact]
    public void Rows_carry_the_offsets_of_each_satellite_orbit()
    {
        var scenario = RelativityScenarios.Load(RelativityScenarios.Shell("gps", 26_561.75, eccentricity: 0.01), "");
        var report = RelativityAnalysis.Build(scenario, CancellationToken.None);

        Assert.Equal(24, report.Satellites.Count);
        var row = report.Satellites[7];
        Assert.Equal((7, "gps"), (row.SatelliteIndex, row.ShellName));
        // Values from SecularRate (checked against REFERENCE-VALUES 1.4 in SecularRateTests): -7.21, +45.79, +38.575 us/day.
        Assert.Equal(-7.21, SecularRate.MicrosecondsPerDay(row.VelocityOffset), 0.01);
        Assert.Equal(45.79, SecularRate.MicrosecondsPerDay(row.GravitationalOffset), 0.01);
        Assert.Equal(38.575, SecularRate.MicrosecondsPerDay(row.NetOffset), 0.005);
        Assert.Equal(row.NetOffset, row.AppliedOffset, 1e-25);
        Assert.Equal(0.0, row.ResidualOffset);
        Assert.Equal(22.9e-9, row.PeriodicAmplitudeSeconds, 0.05e-9); // REFERENCE-VALUES 1.2: e = 0.01 -> 22.9 ns
        Assert.Equal(scenario.Run.Epochs, row.FrequencyOffset.Count);
        Assert.Equal(0.0, row.FrequencyOffset.MaxAbs);
        Assert.Equal(0.0, row.Sagnac.MaxAbs);
        Assert.True(row.Sagnac.Count > 0);
    }

    [Fact]
    public void Range_statistics_of_a_missed_offset_are_those_of_minus_c_y_t()
    {
        // Derived: ground_absorbs = "none" gives -c y t_k at epochs t_k = k step; rms = c y sqrt(mean t_k^2), max = c y t_last.
        var scenario = RelativityScenarios.Load(RelativityScenarios.Shell("s", 27_600), "frequency_offset = \"missed\"\nground_absorbs = \"none\"");
        var row = RelativityAnalysis.Build(scenario, CancellationToken.None).Satellites[0];
        double y = SecularRate.Net(27_600_000, Gm);
        double[] t = [.. Enumerable.Range(0, scenario.Run.Epochs).Select(scenario.Run.EpochTimeSeconds)];

        double rms = C * y * Math.Sqrt(t.Average(x => x * x));
        Assert.Equal(rms, row.FrequencyOffset.Rms, rms * RoundingRelative);
        Assert.Equal(C * y * t[^1], row.FrequencyOffset.MaxAbs, C * y * t[^1] * RoundingRelative);
        Assert.Equal(y, row.ResidualOffset, 1e-25);
        Assert.Equal(0.0, row.AppliedOffset);
    }

    [Fact]
    public void Missed_user_level_terms_are_counted_over_the_users_that_see_the_satellite()
    {
        // Bounds from REFERENCE-VALUES checks 6 and 7 (Sagnac at most about 40 m, Shapiro 12.7 to 18.7 mm for GPS-like radii).
        var scenario = RelativityScenarios.Load(RelativityScenarios.Shell("s", 26_561.75), "sagnac = \"missed\"\nshapiro = \"missed\"");
        var report = RelativityAnalysis.Build(scenario, CancellationToken.None);
        double bound = C * Sagnac.MaximumMagnitudeSeconds(26_561_750, Wgs84.SemiMajorAxisMeters, Wgs84.EarthRotationRateRadPerSecond);

        Assert.All(report.Satellites, r =>
        {
            Assert.True(r.Sagnac.Count > 0);
            Assert.InRange(r.Sagnac.MaxAbs, 1, bound);
            Assert.InRange(r.Shapiro.MaxAbs, 0.0125, 0.019);
            Assert.Equal(r.Sagnac.Count, r.Shapiro.Count);
        });
        Assert.Equal(scenario.Run.Epochs, report.SampledEpochs); // 12 epochs x 72 users is within the budget
        Assert.True(report.Position.Hpe.MaxAbs > 1, "a missed Sagnac correction is not common mode");
    }
}

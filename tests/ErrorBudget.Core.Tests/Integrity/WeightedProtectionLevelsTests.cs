using ErrorBudget.Core.Integrity;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>
/// WLS protection levels (RTCA DO-229 appendix J, REFERENCE-VALUES §4; suggested checks 23-25): against
/// hand-worked geometry, an independent eigen-decomposition of the horizontal covariance, and the
/// invariants of the error ellipse.
/// </summary>
public class WeightedProtectionLevelsTests
{
    /// <summary>Levels are O(10 m) and built from a few flops on an O(1) covariance: 1e-9 m is round-off room.</summary>
    private const double LevelToleranceMeters = 1e-9;

    [Fact]
    public void Zenith_plus_three_on_horizon_with_two_metre_sigmas_gives_hand_worked_levels()
    {
        // Derived by hand (REFERENCE-VALUES §9 row 1): with equal σ = 2 m, D = 4 (GᵀG)⁻¹ and
        // GᵀG = diag(1.5, 1.5) ⊕ [[1, −1], [−1, 4]], so d_E² = d_N² = 4 · 2/3, d_EN = 0, d_U² = 4 · 4/3.
        // d_major = √(8/3) = 1.632993 m; HPL = 6.0 · 1.632993 = 9.797959 m; VPL = 5.33 · √(16/3) = 5.33 · 2.309401 = 12.309108 m.
        var los = new[]
        {
            Geometry.GeometryFixtures.LineOfSight(0, 90), Geometry.GeometryFixtures.LineOfSight(0, 0),
            Geometry.GeometryFixtures.LineOfSight(120, 0), Geometry.GeometryFixtures.LineOfSight(240, 0),
        };
        double[] d = IntegrityFixtures.Covariance(los, [0.25, 0.25, 0.25, 0.25]);

        Assert.Equal(Math.Sqrt(8.0 / 3.0), WeightedProtectionLevels.SemiMajorAxisMeters(d), LevelToleranceMeters);
        Assert.Equal(Math.Sqrt(16.0 / 3.0), WeightedProtectionLevels.VerticalSigmaMeters(d), LevelToleranceMeters);

        var pa = WeightedProtectionLevels.Compute(d, WeightedProtectionLevels.KHorizontalPrecision, WeightedProtectionLevels.KVerticalPrecision);
        Assert.Equal(9.797959, pa.HplMeters, 1e-6); // printed to 7 digits: tolerance 1e-6 m
        Assert.Equal(12.309108, pa.VplMeters, 1e-6);

        var npa = WeightedProtectionLevels.Compute(d, WeightedProtectionLevels.KHorizontalNonPrecision, WeightedProtectionLevels.KVerticalPrecision);
        Assert.Equal(6.18 * Math.Sqrt(8.0 / 3.0), npa.HplMeters, LevelToleranceMeters);
    }

    [Fact]
    public void Five_satellite_weighted_geometry_matches_an_independent_matrix_computation()
    {
        var los = IntegrityFixtures.HandPickedLinesOfSight();
        var weights = IntegrityFixtures.HandPickedWeights();
        double[] tool = IntegrityFixtures.Covariance(los, weights);

        // Independent: D = (GᵀWG)⁻¹ by MathNet's general inverse; d_major² = largest eigenvalue of the E/N block
        // (the semi-major axis of the 1-σ ellipse, an eigen-decomposition rather than the closed form).
        var g = Geometry.GeometryFixtures.GeometryMatrix(los);
        var w = Matrix<double>.Build.DenseOfDiagonalArray(weights);
        var d = (g.Transpose() * w * g).Inverse();
        double dE2 = d[0, 0], dN2 = d[1, 1], dEN = d[0, 1], dU2 = d[2, 2];
        var horizontal = Matrix<double>.Build.DenseOfArray(new[,] { { dE2, dEN }, { dEN, dN2 } });
        double dMajor = Math.Sqrt(horizontal.Evd(Symmetricity.Symmetric).EigenValues.Select(z => z.Real).Max());

        Assert.True(Math.Abs(dEN) > 0.1 * Math.Min(dE2, dN2), $"d_EN = {dEN} too small for a meaningful check");
        for (int j = 0; j < 16; j++)
        {
            Assert.Equal(d[j / 4, j % 4], tool[j], 1e-10); // O(1) m² entries, cond ~ 1e2: 1e-10 m² round-off room
        }

        Assert.Equal(dMajor, WeightedProtectionLevels.SemiMajorAxisMeters(tool), LevelToleranceMeters);
        Assert.Equal(Math.Sqrt(dU2), WeightedProtectionLevels.VerticalSigmaMeters(tool), LevelToleranceMeters);
        var pl = WeightedProtectionLevels.Compute(tool, 6.0, 5.33);
        Assert.Equal(6.0 * dMajor, pl.HplMeters, LevelToleranceMeters);
        Assert.Equal(5.33 * Math.Sqrt(dU2), pl.VplMeters, LevelToleranceMeters);
    }

    [Fact]
    public void Semi_major_axis_is_at_least_the_larger_of_the_east_and_north_sigmas()
    {
        // The largest eigenvalue of a symmetric 2 × 2 block bounds each diagonal entry (Rayleigh quotient);
        // and d_major² + d_minor² = d_E² + d_N² (trace), so d_major² ≤ d_E² + d_N².
        const double RelativeTolerance = 1e-12;
        var rng = new System.Random(2024);
        for (int trial = 0; trial < 300; trial++)
        {
            var los = Geometry.GeometryFixtures.RandomSky(rng, rng.Next(5, 12));
            double[] d = IntegrityFixtures.Covariance(los, Geometry.GeometryFixtures.RandomWeights(rng, los.Length));
            double major = WeightedProtectionLevels.SemiMajorAxisMeters(d);
            double larger = Math.Sqrt(Math.Max(d[0], d[5]));
            Assert.True(major >= larger * (1 - RelativeTolerance), $"d_major {major} < max(d_E, d_N) {larger}");
            Assert.True(major * major <= (d[0] + d[5]) * (1 + RelativeTolerance), $"d_major² {major * major} > d_E² + d_N²");
        }
    }

    [Fact]
    public void Semi_major_axis_is_the_larger_axis_sigma_when_east_and_north_are_uncorrelated()
    {
        // Suggested check 24: d_EN = 0 makes the ellipse axis-aligned, so d_major = max(d_E, d_N) exactly.
        double[] eastLarger = Diagonal(9.0, 4.0, 16.0);
        double[] northLarger = Diagonal(0.25, 2.25, 1.0);
        Assert.Equal(3.0, WeightedProtectionLevels.SemiMajorAxisMeters(eastLarger), LevelToleranceMeters);
        Assert.Equal(1.5, WeightedProtectionLevels.SemiMajorAxisMeters(northLarger), LevelToleranceMeters);
        Assert.Equal(4.0, WeightedProtectionLevels.VerticalSigmaMeters(eastLarger), LevelToleranceMeters);
    }

    [Fact]
    public void Scaling_every_sigma_by_k_scales_both_protection_levels_by_k()
    {
        // Suggested check 23: W → W/k² gives D → k² D, so d_major, d_U and both levels scale by k.
        const double k = 2.7;
        const double RelativeTolerance = 1e-12;
        var rng = new System.Random(17);
        var los = Geometry.GeometryFixtures.RandomSky(rng, 8);
        var weights = Geometry.GeometryFixtures.RandomWeights(rng, 8);
        var a = WeightedProtectionLevels.Compute(IntegrityFixtures.Covariance(los, weights), 6.0, 5.33);
        var b = WeightedProtectionLevels.Compute(
            IntegrityFixtures.Covariance(los, weights.Select(x => x / (k * k)).ToArray()), 6.0, 5.33);
        Assert.Equal(k * a.HplMeters, b.HplMeters, RelativeTolerance * k * a.HplMeters);
        Assert.Equal(k * a.VplMeters, b.VplMeters, RelativeTolerance * k * a.VplMeters);
    }

    [Fact]
    public void Vertical_k_factor_is_the_two_sided_gaussian_quantile_of_one_in_ten_million()
    {
        // Suggested check 25: K_V = 5.33 (RTCA DO-229, from memory) ≈ Q⁻¹(0.5e-7) = 5.327 (derived), tolerance 0.01.
        double q = -Normal.InvCDF(0.0, 1.0, 0.5e-7);
        Assert.Equal(5.327, q, 1e-3); // REFERENCE-VALUES §4 prints 5.3267: 1e-3 covers its rounding
        Assert.Equal(WeightedProtectionLevels.KVerticalPrecision, q, 0.01);
        Assert.Equal(6.0, WeightedProtectionLevels.KHorizontalPrecision);
        Assert.Equal(6.18, WeightedProtectionLevels.KHorizontalNonPrecision);
    }

    [Fact]
    public void Short_covariance_or_a_bad_k_factor_is_rejected()
    {
        var d = Diagonal(1, 1, 1);
        Assert.Throws<ArgumentOutOfRangeException>(() => WeightedProtectionLevels.SemiMajorAxisMeters(new double[15]));
        Assert.Throws<ArgumentOutOfRangeException>(() => WeightedProtectionLevels.VerticalSigmaMeters(new double[15]));
        Assert.Throws<ArgumentOutOfRangeException>(() => WeightedProtectionLevels.Compute(d, 0.0, 5.33));
        Assert.Throws<ArgumentOutOfRangeException>(() => WeightedProtectionLevels.Compute(d, 6.0, double.NaN));
        Assert.Throws<ArgumentOutOfRangeException>(() => WeightedProtectionLevels.Compute(d, double.PositiveInfinity, 5.33));
    }

    [Fact]
    public void Compute_does_not_allocate_after_warm_up()
    {
        double[] d = Diagonal(2.0, 3.0, 5.0);
        d[1] = d[4] = 0.7;
        double sum = 0;
        for (int i = 0; i < 1000; i++)
        {
            sum += WeightedProtectionLevels.Compute(d, 6.0, 5.33).HplMeters;
        }

        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int i = 0; i < 1000; i++)
        {
            sum += WeightedProtectionLevels.Compute(d, 6.0, 5.33).VplMeters;
        }

        Assert.Equal(0L, GC.GetAllocatedBytesForCurrentThread() - before);
        Assert.True(sum > 0);
    }

    /// <summary>A 4 × 4 covariance diag(d_E², d_N², d_U², 1).</summary>
    private static double[] Diagonal(double east2, double north2, double up2)
    {
        var d = new double[16];
        d[0] = east2;
        d[5] = north2;
        d[10] = up2;
        d[15] = 1.0;
        return d;
    }
}

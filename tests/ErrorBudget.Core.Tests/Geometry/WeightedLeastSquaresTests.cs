using MathNet.Numerics.LinearAlgebra;

namespace ErrorBudget.Core.Tests.Geometry;

/// <summary>
/// The projection S = (GᵀWG)⁻¹GᵀW and covariance (GᵀWG)⁻¹ against their defining algebra, with MathNet's
/// general inverse as an independent reference (standard WLS, REFERENCE-VALUES §4 "WLS"; suggested check 23).
/// </summary>
public class WeightedLeastSquaresTests
{
    /// <summary>Entries of S and of the covariance are O(1) for these skies; 1e-9 leaves room for cond(GᵀWG) ~ 1e4.</summary>
    private const double MatrixTolerance = 1e-9;

    private static double MaxAbs(Matrix<double> m) => m.Enumerate().Max(Math.Abs);

    [Fact]
    public void Projection_times_geometry_is_the_identity_for_random_geometries_and_weights()
    {
        var rng = new System.Random(1234);
        int solved = 0;
        for (int trial = 0; trial < 200; trial++)
        {
            int m = rng.Next(5, 15);
            var los = GeometryFixtures.RandomSky(rng, m);
            var (ok, projection, _, _) = GeometryFixtures.Solve(los, GeometryFixtures.RandomWeights(rng, m));
            if (!ok)
            {
                continue;
            }

            solved++;
            // Derived: S G = (GᵀWG)⁻¹ GᵀWG = I.
            var sg = GeometryFixtures.ProjectionMatrix(projection, m) * GeometryFixtures.GeometryMatrix(los);
            Assert.True(MaxAbs(sg - Matrix<double>.Build.DenseIdentity(4)) <= MatrixTolerance);
        }

        Assert.True(solved >= 190, $"only {solved} of 200 random skies were solvable");
    }

    [Fact]
    public void Equal_weights_give_the_ordinary_least_squares_solution()
    {
        var rng = new System.Random(99);
        for (int trial = 0; trial < 50; trial++)
        {
            int m = rng.Next(5, 12);
            var los = GeometryFixtures.RandomSky(rng, m);
            const double w = 4.0; // σ = 0.5 m everywhere
            var (ok, projection, covariance, _) = GeometryFixtures.Solve(los, Enumerable.Repeat(w, m).ToArray());
            Assert.True(ok);

            var g = GeometryFixtures.GeometryMatrix(los);
            var h = g.TransposeThisAndMultiply(g).Inverse();
            var ols = h * g.Transpose();
            Assert.True(MaxAbs(GeometryFixtures.ProjectionMatrix(projection, m) - ols) <= MatrixTolerance);
            Assert.True(MaxAbs(GeometryFixtures.Square(covariance, 4) - (h / w)) <= MatrixTolerance);
        }
    }

    [Fact]
    public void Weighted_solution_matches_a_general_matrix_inverse()
    {
        var rng = new System.Random(5);
        for (int trial = 0; trial < 50; trial++)
        {
            int m = rng.Next(5, 12);
            var los = GeometryFixtures.RandomSky(rng, m);
            var weights = GeometryFixtures.RandomWeights(rng, m);
            var (ok, projection, covariance, _) = GeometryFixtures.Solve(los, weights);
            Assert.True(ok);

            var g = GeometryFixtures.GeometryMatrix(los);
            var wMat = Matrix<double>.Build.DenseOfDiagonalArray(weights);
            var cov = (g.Transpose() * wMat * g).Inverse();
            var s = cov * g.Transpose() * wMat;
            double scale = MaxAbs(cov);
            Assert.True(MaxAbs(GeometryFixtures.Square(covariance, 4) - cov) <= MatrixTolerance * scale);
            Assert.True(MaxAbs(GeometryFixtures.ProjectionMatrix(projection, m) - s) <= MatrixTolerance);
        }
    }

    [Fact]
    public void Scaling_every_sigma_by_k_scales_the_covariance_by_k_squared_and_keeps_the_projection()
    {
        // Derived: W → W/k² gives (GᵀWG)⁻¹ → k²(GᵀWG)⁻¹ and leaves S unchanged (suggested check 23).
        const double k = 3.7;
        const double RelativeTolerance = 1e-12;
        var rng = new System.Random(31);
        var los = GeometryFixtures.RandomSky(rng, 9);
        var weights = GeometryFixtures.RandomWeights(rng, 9);
        var a = GeometryFixtures.Solve(los, weights);
        var b = GeometryFixtures.Solve(los, weights.Select(w => w / (k * k)).ToArray());
        Assert.True(a.Ok && b.Ok);

        double covScale = a.Covariance.Max(Math.Abs);
        for (int j = 0; j < 16; j++)
        {
            Assert.Equal(k * k * a.Covariance[j], b.Covariance[j], RelativeTolerance * k * k * covScale);
        }

        for (int j = 0; j < a.Projection.Length; j++)
        {
            Assert.Equal(a.Projection[j], b.Projection[j], RelativeTolerance);
        }

        Assert.Equal(a.Dop, b.Dop);
    }

    [Fact]
    public void Zero_weight_excludes_a_satellite_from_the_estimate()
    {
        // Derived: a zero weight zeroes that column of S, and S equals the solution without the satellite.
        const double Tolerance = 1e-12;
        var rng = new System.Random(77);
        var los = GeometryFixtures.RandomSky(rng, 7);
        var weights = GeometryFixtures.RandomWeights(rng, 7);
        weights[3] = 0.0;
        var all = GeometryFixtures.Solve(los, weights);
        var keep = new[] { 0, 1, 2, 4, 5, 6 };
        var subset = GeometryFixtures.Solve(keep.Select(i => los[i]).ToArray(), keep.Select(i => weights[i]).ToArray());
        Assert.True(all.Ok && subset.Ok);
        for (int q = 0; q < 4; q++)
        {
            Assert.Equal(0.0, all.Projection[(q * 7) + 3]);
            for (int c = 0; c < keep.Length; c++)
            {
                Assert.Equal(subset.Projection[(q * 6) + c], all.Projection[(q * 7) + keep[c]], Tolerance);
            }
        }
    }
}

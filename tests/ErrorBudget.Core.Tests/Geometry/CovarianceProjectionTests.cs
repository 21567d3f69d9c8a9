using ErrorBudget.Core.Geometry;
using MathNet.Numerics.LinearAlgebra;

namespace ErrorBudget.Core.Tests.Geometry;

/// <summary>ENU error covariance S_enu diag(var) S_enuᵀ and its Cholesky factor, against MathNet.</summary>
public class CovarianceProjectionTests
{
    private const double RelativeTolerance = 1e-12;

    [Fact]
    public void ProjectCovariance_equals_the_matrix_product_computed_independently()
    {
        var rng = new System.Random(11);
        for (int trial = 0; trial < 50; trial++)
        {
            int m = rng.Next(5, 12);
            var los = GeometryFixtures.RandomSky(rng, m);
            var (ok, projection, _, _) = GeometryFixtures.Solve(los, GeometryFixtures.RandomWeights(rng, m));
            Assert.True(ok);
            var variances = Enumerable.Range(0, m).Select(_ => 0.1 + (9 * rng.NextDouble())).ToArray();

            var enu = new double[9];
            PositionSolution.ProjectCovariance(projection, m, variances, enu);

            var sEnu = GeometryFixtures.ProjectionMatrix(projection, m).SubMatrix(0, 3, 0, m);
            var expected = sEnu * Matrix<double>.Build.DenseOfDiagonalArray(variances) * sEnu.Transpose();
            double scale = expected.Enumerate().Max(Math.Abs);
            for (int j = 0; j < 9; j++)
            {
                Assert.Equal(expected[j / 3, j % 3], enu[j], RelativeTolerance * scale);
            }
        }
    }

    [Fact]
    public void Projecting_the_assumed_variances_gives_the_position_block_of_the_covariance()
    {
        // Derived: S W⁻¹ Sᵀ = (GᵀWG)⁻¹ GᵀW W⁻¹ W G (GᵀWG)⁻¹ = (GᵀWG)⁻¹ when var = 1/w.
        var rng = new System.Random(12);
        var los = GeometryFixtures.RandomSky(rng, 9);
        var weights = GeometryFixtures.RandomWeights(rng, 9);
        var (ok, projection, covariance, _) = GeometryFixtures.Solve(los, weights);
        Assert.True(ok);
        var enu = new double[9];
        PositionSolution.ProjectCovariance(projection, 9, weights.Select(w => 1.0 / w).ToArray(), enu);
        double scale = covariance.Max(Math.Abs);
        for (int r = 0; r < 3; r++)
        {
            for (int c = 0; c < 3; c++)
            {
                Assert.Equal(covariance[(r * 4) + c], enu[(r * 3) + c], 1e-10 * scale);
            }
        }
    }

    [Fact]
    public void TryCholesky3_reproduces_a_positive_definite_matrix()
    {
        var rng = new System.Random(13);
        for (int trial = 0; trial < 100; trial++)
        {
            var a = Matrix<double>.Build.Dense(3, 3, (_, _) => (2 * rng.NextDouble()) - 1);
            var cov = (a * a.Transpose()) + (0.01 * Matrix<double>.Build.DenseIdentity(3));
            AssertFactorReproduces(cov);
        }
    }

    [Fact]
    public void TryCholesky3_tolerates_a_rank_deficient_covariance()
    {
        // Rank 2 (derived: v vᵀ + w wᵀ) and rank 1; the rounding of the last pivot may be slightly negative.
        var v = Vector<double>.Build.DenseOfArray([1.0, 2.0, -0.5]);
        var w = Vector<double>.Build.DenseOfArray([0.3, -1.0, 2.0]);
        AssertFactorReproduces(v.OuterProduct(v) + w.OuterProduct(w));
        AssertFactorReproduces(v.OuterProduct(v));
        AssertFactorReproduces(Matrix<double>.Build.Dense(3, 3));
        AssertFactorReproduces(Matrix<double>.Build.DenseOfDiagonalArray([4.0, 0.0, 9.0]));
    }

    [Fact]
    public void TryCholesky3_rejects_indefinite_and_non_finite_matrices()
    {
        var lower = new double[9];
        Assert.False(PositionSolution.TryCholesky3([1, 2, 0, 2, 1, 0, 0, 0, 1], lower));   // eigenvalue −1
        Assert.False(PositionSolution.TryCholesky3([1, 0, 0, 0, 0, 1, 0, 1, 0], lower));   // zero pivot, non-zero coupling
        Assert.False(PositionSolution.TryCholesky3([-1, 0, 0, 0, 1, 0, 0, 0, 1], lower));
        Assert.False(PositionSolution.TryCholesky3([double.NaN, 0, 0, 0, 1, 0, 0, 0, 1], lower));
    }

    private static void AssertFactorReproduces(Matrix<double> cov)
    {
        var lower = new double[9];
        Assert.True(PositionSolution.TryCholesky3(cov.ToRowMajorArray(), lower));
        var l = GeometryFixtures.Square(lower, 3);
        Assert.Equal(0.0, lower[1]);
        Assert.Equal(0.0, lower[2]);
        Assert.Equal(0.0, lower[5]);
        double scale = Math.Max(cov.Trace(), double.Epsilon);
        Assert.True((l * l.Transpose() - cov).Enumerate().Max(Math.Abs) <= 1e-12 * scale);
    }
}

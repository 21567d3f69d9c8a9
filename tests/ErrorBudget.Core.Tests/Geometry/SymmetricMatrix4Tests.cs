using ErrorBudget.Core.Geometry;

namespace ErrorBudget.Core.Tests.Geometry;

public sealed class SymmetricMatrix4Tests
{
    /// <summary>A = B Bᵀ + I for a fixed-seed B: symmetric positive definite, condition number of order 10-100.</summary>
    private static double[] RandomSpd(int seed)
    {
        var rng = new System.Random(seed);
        var b = new double[16];
        for (int i = 0; i < 16; i++)
        {
            b[i] = (rng.NextDouble() * 2) - 1;
        }

        var a = new double[16];
        for (int r = 0; r < 4; r++)
        {
            for (int c = 0; c < 4; c++)
            {
                double s = r == c ? 1.0 : 0.0;
                for (int k = 0; k < 4; k++)
                {
                    s += b[(r * 4) + k] * b[(c * 4) + k];
                }

                a[(r * 4) + c] = s;
            }
        }

        return a;
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void The_inverse_times_the_matrix_is_the_identity_and_the_diagonal_form_agrees_to_the_bit(int seed)
    {
        double[] a = RandomSpd(seed);
        var inverse = new double[16];
        Assert.True(SymmetricMatrix4.TryInvert(a, inverse, 1e-12));
        for (int r = 0; r < 4; r++)
        {
            for (int c = 0; c < 4; c++)
            {
                double s = 0;
                for (int k = 0; k < 4; k++)
                {
                    s += inverse[(r * 4) + k] * a[(k * 4) + c];
                }

                Assert.Equal(r == c ? 1.0 : 0.0, s, 1e-12);
                Assert.Equal(inverse[(r * 4) + c], inverse[(c * 4) + r]);
            }
        }

        Assert.True(SymmetricMatrix4.TryInverseDiagonal(a, 1e-12, out double d0, out double d1, out double d2, out double d3));
        Assert.Equal([inverse[0], inverse[5], inverse[10], inverse[15]], [d0, d1, d2, d3]);
    }

    [Fact]
    public void Only_the_lower_triangle_is_read()
    {
        double[] a = RandomSpd(4);
        double[] lowerOnly = (double[])a.Clone();
        lowerOnly[1] = lowerOnly[2] = lowerOnly[3] = lowerOnly[6] = lowerOnly[7] = lowerOnly[11] = double.NaN;
        var expected = new double[16];
        var actual = new double[16];
        Assert.True(SymmetricMatrix4.TryInvert(a, expected, 1e-12));
        Assert.True(SymmetricMatrix4.TryInvert(lowerOnly, actual, 1e-12));
        Assert.Equal(expected, actual);
    }

    [Fact]
    public void Singular_and_non_finite_matrices_are_refused()
    {
        // Rank 3: the fourth row and column are the sum of the first two.
        double[] a = RandomSpd(5);
        for (int i = 0; i < 4; i++)
        {
            a[12 + i] = a[i] + a[4 + i];
        }

        for (int i = 0; i < 4; i++)
        {
            a[(i * 4) + 3] = a[12 + i];
        }

        a[15] = a[0] + a[5] + (2 * a[1]);
        var inverse = new double[16];
        Assert.False(SymmetricMatrix4.TryInvert(a, inverse, 1e-12));
        Assert.False(SymmetricMatrix4.TryInverseDiagonal(a, 1e-12, out _, out _, out _, out _));

        double[] nan = RandomSpd(6);
        nan[9] = double.NaN;
        Assert.False(SymmetricMatrix4.TryInvert(nan, inverse, 1e-12));
        double[] negative = RandomSpd(7);
        negative[0] = -1;
        Assert.False(SymmetricMatrix4.TryInvert(negative, inverse, 1e-12));
    }
}

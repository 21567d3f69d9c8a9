using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Random;

public class CounterRngVectorTwinTests
{
    // FastMath256's log and sin/cos vs Math.Log / Sin / Cos: about 1e-15 relative in ln u and in the
    // sine and cosine, times r <= 8.57, stays near 1e-14; 1e-12 is the contract of FillNormals.
    private const double TwinToleranceAbs = 1e-12;

    public static TheoryData<ulong> FirstIndices => new() { 0, 1, 2, 3, 7, 8, (1UL << 33) + 1, 1UL << 40, 999_999_999_999_999 };

    [Theory]
    [MemberData(nameof(FirstIndices))]
    public void Vector_fill_matches_scalar_fill_for_every_length_up_to_37(ulong firstIndex)
    {
        ulong key = CounterRng.Key(77, RandomPurpose.UserLocal, 4, 5, 6);
        for (int length = 0; length <= 37; length++)
        {
            var vector = new double[length + 2];
            var scalar = new double[length + 2];
            vector[^1] = scalar[^1] = vector[^2] = scalar[^2] = 123.0; // guard cells
            CounterRng.FillNormals(key, firstIndex, vector.AsSpan(1, length));
            CounterRng.FillNormalsScalar(key, firstIndex, scalar.AsSpan(1, length));
            for (int j = 0; j < vector.Length; j++)
            {
                Assert.True(Math.Abs(vector[j] - scalar[j]) <= TwinToleranceAbs,
                    $"length {length}, element {j}: {vector[j]:R} vs {scalar[j]:R}");
            }

            Assert.Equal(123.0, vector[^1]); // nothing written past the span
        }
    }

    [Fact]
    public void Vector_fill_matches_scalar_fill_over_a_million_normals()
    {
        const int N = 1_000_000;
        ulong key = CounterRng.Key(2024, RandomPurpose.SatelliteClock, 0, 0, 0);
        var vector = new double[N];
        var scalar = new double[N];
        CounterRng.FillNormals(key, 1, vector);
        CounterRng.FillNormalsScalar(key, 1, scalar);
        double worst = 0;
        for (int j = 0; j < N; j++)
        {
            worst = Math.Max(worst, Math.Abs(vector[j] - scalar[j]));
        }

        Assert.True(worst <= TwinToleranceAbs, $"worst difference {worst:R}");
    }
}

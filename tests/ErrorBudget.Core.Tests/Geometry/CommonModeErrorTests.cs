namespace ErrorBudget.Core.Tests.Geometry;

/// <summary>
/// A range error common to every satellite is absorbed by the receiver clock (derived from S G = I: the
/// clock column of G is all ones, so S·1 = e₄). Property test over random skies and weights.
/// </summary>
public class CommonModeErrorTests
{
    private const double CommonModeTolerance = 1e-9;

    [Fact]
    public void Identical_range_error_on_every_satellite_moves_only_the_clock()
    {
        const double commonErrorMeters = 12.5;
        var rng = new System.Random(424242);
        int solved = 0;
        for (int trial = 0; trial < 200; trial++)
        {
            int m = rng.Next(5, 15);
            var (ok, projection, _, _) = GeometryFixtures.Solve(GeometryFixtures.RandomSky(rng, m), GeometryFixtures.RandomWeights(rng, m));
            if (!ok)
            {
                continue;
            }

            solved++;
            for (int q = 0; q < 4; q++)
            {
                double rowSum = 0.0;
                for (int i = 0; i < m; i++)
                {
                    rowSum += projection[(q * m) + i];
                }

                double expected = q == 3 ? 1.0 : 0.0;
                Assert.True(Math.Abs(rowSum - expected) <= CommonModeTolerance, $"row {q}: S·1 = {rowSum}");
                Assert.Equal(expected * commonErrorMeters, rowSum * commonErrorMeters, CommonModeTolerance * commonErrorMeters);
            }
        }

        Assert.True(solved >= 190, $"only {solved} of 200 random skies were solvable");
    }
}

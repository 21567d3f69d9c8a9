using System.Runtime.Intrinsics;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Random;

public class FastMath256Tests
{
    // The series bounds in FastMath256 give about 1e-15; a few ulp of rounding on top.
    private const double LogRelativeTolerance = 4e-15;
    private const double SinCosAbsoluteTolerance = 4e-15;

    [Fact]
    public void Log_matches_Math_Log_from_the_smallest_uniform_to_large_position_errors()
    {
        var values = new List<double> { CounterRng.HalfUlpOfUnit, 1e-16, 0.5, Math.Sqrt(0.5), Math.BitDecrement(Math.Sqrt(0.5)), 0.7071067811865476, 0.999, 1.0 - CounterRng.HalfUlpOfUnit };
        ulong key = CounterRng.Key(5, RandomPurpose.Spare, 1, 2, 3);
        for (ulong i = 0; i < 100_000; i++)
        {
            values.Add(CounterRng.Uniform(key, i));
            values.Add(Math.Pow(2, -53 * CounterRng.Uniform(key, i + 1_000_000))); // log-uniform over the whole range
            values.Add(Math.Exp(40 * (CounterRng.Uniform(key, i + 2_000_000) - 0.5))); // sketch values, 2e-9 to 5e8
        }

        double worst = 0;
        foreach (double u in values)
        {
            double fast = FastMath256.LogOfPositive(Vector256.Create(u)).GetElement(0);
            double exact = Math.Log(u);
            worst = Math.Max(worst, Math.Abs(fast - exact) / Math.Abs(exact));
        }

        Assert.True(worst <= LogRelativeTolerance, $"worst relative error {worst:E3}");
    }

    [Fact]
    public void Sine_and_cosine_of_the_turn_match_Math_in_every_quadrant_and_at_the_quadrant_edges()
    {
        var bits = new List<ulong> { 0, ulong.MaxValue, 1UL << 62, 1UL << 63, 3UL << 62, (1UL << 62) - 1, (1UL << 63) - 1 };
        ulong key = CounterRng.Key(6, RandomPurpose.Spare, 1, 2, 3);
        for (ulong i = 0; i < 200_000; i++)
        {
            bits.Add(CounterRng.Bits(key, i));
        }

        double worst = 0;
        foreach (ulong b in bits)
        {
            (Vector256<double> sin, Vector256<double> cos) = FastMath256.SinCosOfTurn(Vector256.Create(b));
            double angle = CounterRng.TwoPi * CounterRng.UniformFromBits(b);
            worst = Math.Max(worst, Math.Abs(sin.GetElement(0) - Math.Sin(angle)));
            worst = Math.Max(worst, Math.Abs(cos.GetElement(0) - Math.Cos(angle)));
        }

        Assert.True(worst <= SinCosAbsoluteTolerance, $"worst absolute error {worst:E3}");
    }
}

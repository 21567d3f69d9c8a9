using ErrorBudget.Core.Exact;
using System.Runtime.Intrinsics;
using MathNet.Numerics;

namespace ErrorBudget.Core.Tests.Exact;

public class TaylorErfTests
{
    [Theory]
    // erf at published arguments (Abramowitz & Stegun, Table 7.1, extended digits from memory).
    [InlineData(0.5, 0.5204998778130465)]
    [InlineData(1.0, 0.8427007929497149)]
    [InlineData(2.0, 0.9953222650189527)]
    [InlineData(3.0, 0.9999779095030014)]
    public void Matches_tabulated_values(double x, double expected)
    {
        Assert.Equal(expected, TaylorErf.Of(x), 1e-15);
    }

    [Fact]
    public void Agrees_with_MathNet_everywhere_on_its_domain()
    {
        // A dense sweep that falls between the table's nodes (step not a multiple of 1/16), and the
        // interval ends |t| = 1/32 where the truncated series is least accurate.
        double worstAbsolute = 0, worstRelative = 0;
        for (int k = 0; k <= 600_000; k++)
        {
            double x = k * 1e-5 * 1.0000037;
            Check(x);
        }

        for (int i = 0; i < 96; i++)
        {
            Check((i + 0.5) / 16.0);
            Check(Math.BitDecrement((i + 0.5) / 16.0));
        }

        // A few ulps of 1 (1.1e-16) and of the small values near zero (MathNet's own error included).
        Assert.True(worstAbsolute < 5e-16, $"worst absolute difference {worstAbsolute:E2}");
        Assert.True(worstRelative < 2e-15, $"worst relative difference {worstRelative:E2}");

        void Check(double x)
        {
            double expected = SpecialFunctions.Erf(x), actual = TaylorErf.Of(x);
            worstAbsolute = Math.Max(worstAbsolute, Math.Abs(actual - expected));
            if (expected > 0)
            {
                worstRelative = Math.Max(worstRelative, Math.Abs(actual - expected) / expected);
            }
        }
    }

    [Fact]
    public void Is_odd_saturates_at_six_and_keeps_NaN()
    {
        Assert.Equal(-TaylorErf.Of(0.731), TaylorErf.Of(-0.731));
        Assert.Equal(0.0, TaylorErf.Of(0.0));
        Assert.Equal(1.0, TaylorErf.Of(6.0));
        Assert.Equal(1.0, TaylorErf.Of(double.PositiveInfinity));
        Assert.Equal(-1.0, TaylorErf.Of(-40.0));
        Assert.True(double.IsNaN(TaylorErf.Of(double.NaN)));
        // Just below the saturation the table gives 1 - erfc(6) = 1 - 2.2e-17, which rounds to 1 as well.
        Assert.Equal(SpecialFunctions.Erf(Math.BitDecrement(6.0)), TaylorErf.Of(Math.BitDecrement(6.0)), 1e-16);
    }

    [Fact]
    public void The_vector_form_gives_the_scalar_bits()
    {
        Assert.True(TaylorErf.VectorAvailable, "this machine has AVX2 (REFERENCE.md)");
        var lanes = new double[4];
        for (int k = -2000; k <= 2000; k++)
        {
            // Mixed lanes: inside the table, at the saturation and beyond, both signs.
            double x = k * 0.00371;
            var v = Vector256.Create(x, -x * 1.7, x + 6.0, x * 0.31);
            TaylorErf.Of(v).CopyTo(lanes);
            Assert.Equal(TaylorErf.Of(x), lanes[0]);
            Assert.Equal(TaylorErf.Of(-x * 1.7), lanes[1]);
            Assert.Equal(TaylorErf.Of(x + 6.0), lanes[2]);
            Assert.Equal(TaylorErf.Of(x * 0.31), lanes[3]);
        }

        TaylorErf.Of(Vector256.Create(7.0, -8.0, 6.0, 100.0)).CopyTo(lanes);
        Assert.Equal([1.0, -1.0, 1.0, 1.0], lanes);
    }

    [Fact]
    public void Allocates_nothing()
    {
        TaylorErf.Of(1.3);
        long before = GC.GetAllocatedBytesForCurrentThread();
        double sum = 0;
        for (int k = 0; k < 1000; k++)
        {
            sum += TaylorErf.Of(k * 0.005);
        }

        Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
        Assert.True(sum > 0);
    }
}

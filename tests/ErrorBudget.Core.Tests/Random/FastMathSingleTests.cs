using System.Runtime.Intrinsics;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Random;

public class FastMathSingleTests
{
    private static float[] LogArguments()
    {
        // Uniforms down to 2^-41 and errors from 1e-9 m to 1e5 m, log-spaced, plus powers of two and
        // the values next to sqrt(1/2) and sqrt(2), where the reduction switches exponent.
        var x = new List<float>();
        for (int i = 0; i <= 20000; i++)
        {
            x.Add((float)Math.Exp(-28.4 + (40.0 * i / 20000)));
        }

        for (int e = -41; e <= 16; e++)
        {
            float p = MathF.ScaleB(1f, e);
            x.AddRange([p, MathF.BitIncrement(p), MathF.BitDecrement(p), p * 0.70710677f, p * 0.7071068f, p * 1.4142135f, p * 1.4142137f]);
        }

        return [.. x];
    }

    [Fact]
    public void The_logarithm_is_within_three_float_ulps_of_the_double_one()
    {
        // Tolerance: 3 ulps of the float result (2^-23 relative each) plus 1e-7 absolute near ln x = 0,
        // where a relative bound is meaningless (x within 1e-7 of 1).
        foreach (float x in LogArguments())
        {
            double exact = Math.Log(x);
            float got = FastMathSingle.Log(x);
            double tolerance = (3 * Math.Abs(exact) * Math.Pow(2, -23)) + 1e-7;
            Assert.True(Math.Abs(got - exact) <= tolerance, $"ln({x:R}) = {got:R}, exact {exact:R}");
        }
    }

    [Fact]
    public void The_vector_logarithm_gives_the_bits_of_the_scalar_one()
    {
        float[] x = LogArguments();
        for (int i = 0; i + 8 <= x.Length; i += 8)
        {
            Vector256<float> got = FastMathSingle.Log(Vector256.Create(x.AsSpan(i, 8)));
            for (int k = 0; k < 8; k++)
            {
                Assert.Equal(BitConverter.SingleToInt32Bits(FastMathSingle.Log(x[i + k])), BitConverter.SingleToInt32Bits(got[k]));
            }
        }
    }

    [Fact]
    public void Sine_and_cosine_of_a_turn_are_within_two_ulps_of_one_of_the_double_ones()
    {
        // 2^16 angles spread over the four quadrants, plus the quadrant edges. Tolerance: 2.5e-7
        // absolute (two float ulps of 1 plus the rounding of pi/2 in float).
        var angles = Enumerable.Range(0, 1 << 16).Select(i => i * 256 + (i % 251))
            .Concat([0, 1, (1 << 22) - 1, 1 << 22, (1 << 23) - 1, 1 << 23, (3 << 22) - 1, 3 << 22, (1 << 24) - 1]);
        foreach (int a in angles)
        {
            double angle = 2 * Math.PI * (a + 0.5) / (1 << 24);
            (float sin, float cos) = FastMathSingle.SinCosOfTurn(a);
            Assert.True(Math.Abs(sin - Math.Sin(angle)) <= 2.5e-7, $"sin at a = {a}: {sin:R} vs {Math.Sin(angle):R}");
            Assert.True(Math.Abs(cos - Math.Cos(angle)) <= 2.5e-7, $"cos at a = {a}: {cos:R} vs {Math.Cos(angle):R}");
        }
    }

    [Fact]
    public void The_vector_sine_and_cosine_give_the_bits_of_the_scalar_ones()
    {
        for (int start = 0; start < (1 << 24); start += 8 * 4099)
        {
            var a = Vector256.Create(start, start + 1, start + 2, start + 3, start + (1 << 22), start + 5, start + 6, (start + 7) & ((1 << 24) - 1));
            a &= Vector256.Create((1 << 24) - 1);
            (Vector256<float> sin, Vector256<float> cos) = FastMathSingle.SinCosOfTurn(a);
            for (int k = 0; k < 8; k++)
            {
                (float s, float c) = FastMathSingle.SinCosOfTurn(a[k]);
                Assert.Equal(BitConverter.SingleToInt32Bits(s), BitConverter.SingleToInt32Bits(sin[k]));
                Assert.Equal(BitConverter.SingleToInt32Bits(c), BitConverter.SingleToInt32Bits(cos[k]));
            }
        }
    }

    [Fact]
    public void The_sixteen_lane_logarithm_gives_the_bits_of_the_scalar_one()
    {
        Assert.True(Vector512.IsHardwareAccelerated, "this machine accelerates Vector512 (REFERENCE.md)");
        float[] x = LogArguments();
        for (int i = 0; i + 16 <= x.Length; i += 16)
        {
            Vector512<float> got = FastMathSingle.Log(Vector512.Create(x.AsSpan(i, 16)));
            for (int k = 0; k < 16; k++)
            {
                Assert.Equal(BitConverter.SingleToInt32Bits(FastMathSingle.Log(x[i + k])), BitConverter.SingleToInt32Bits(got[k]));
            }
        }
    }

    [Fact]
    public void The_sixteen_lane_sine_and_cosine_give_the_bits_of_the_scalar_ones()
    {
        Assert.True(Vector512.IsHardwareAccelerated, "this machine accelerates Vector512 (REFERENCE.md)");
        var lanes = new int[16];
        for (int start = 0; start < (1 << 24); start += 16 * 4099)
        {
            for (int k = 0; k < 16; k++)
            {
                // Every quadrant in each vector: lane k is offset by (k mod 4) quarter turns.
                lanes[k] = (start + k + ((k % 4) << 22)) & ((1 << 24) - 1);
            }

            (Vector512<float> sin, Vector512<float> cos) = FastMathSingle.SinCosOfTurn(Vector512.Create(lanes));
            for (int k = 0; k < 16; k++)
            {
                (float s, float c) = FastMathSingle.SinCosOfTurn(lanes[k]);
                Assert.Equal(BitConverter.SingleToInt32Bits(s), BitConverter.SingleToInt32Bits(sin[k]));
                Assert.Equal(BitConverter.SingleToInt32Bits(c), BitConverter.SingleToInt32Bits(cos[k]));
            }
        }
    }
}

using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Random;

/// <summary>
/// Single-precision twins of <see cref="FastMath256"/> for the hot loop's 8- and 16-lane float paths: ln x and
/// sin/cos of a 24-bit turn. Each vector form has a scalar form with the same operations in the same
/// order (FMA, division and square root are correctly rounded in both), so the two give identical bits.
/// The truncated series are textbook identities (common practice); the tests hold them to Math.Log /
/// Sin / Cos within a few float ulps.
/// </summary>
internal static class FastMathSingle
{
    private const float Ln2High = 0.693145752f;            // ln 2 split in two (Cody-Waite): k * high is exact for |k| <= 2^8
    private const float Ln2Low = 1.42860677e-6f;
    private const int SqrtHalfBits = 0x3F3504F3;           // bits of sqrt(1/2) as a float
    private const float HalfPi = 1.57079633f;

    /// <summary>
    /// ln x for a positive, finite, normal float (the normal generator's uniforms in [2^-41, 1] and the
    /// sketch's position errors above 1e-9 m): x = 2^k f, f in [sqrt(1/2), sqrt(2)), ln f = 2 atanh(s),
    /// s = (f - 1) / (f + 1), |s| &lt;= 0.1716; the series to s^9 leaves a relative error below 1e-9
    /// (next term 2 s^11 / 11), so the result is within a few float ulps of ln x.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector256<float> Log(Vector256<float> x)
    {
        Vector256<int> bits = x.AsInt32();
        Vector256<int> k = Vector256.ShiftRightArithmetic(bits - Vector256.Create(SqrtHalfBits), 23);
        Vector256<float> f = (bits - Vector256.ShiftLeft(k, 23)).AsSingle();
        Vector256<float> one = Vector256<float>.One;
        Vector256<float> s = (f - one) / (f + one);
        Vector256<float> z = s * s;
        Vector256<float> p = Vector256.FusedMultiplyAdd(Vector256.Create(2f / 9), z, Vector256.Create(2f / 7));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2f / 5));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2f / 3));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2f));
        Vector256<float> kf = Vector256.ConvertToSingle(k);
        return Vector256.FusedMultiplyAdd(kf, Vector256.Create(Ln2High), Vector256.FusedMultiplyAdd(kf, Vector256.Create(Ln2Low), s * p));
    }

    /// <summary>The scalar twin of <see cref="Log(Vector256{float})"/> (identical bits).</summary>
    public static float Log(float x)
    {
        int bits = BitConverter.SingleToInt32Bits(x);
        int k = (bits - SqrtHalfBits) >> 23;
        float f = BitConverter.Int32BitsToSingle(bits - (k << 23));
        float s = (f - 1f) / (f + 1f);
        float z = s * s;
        float p = MathF.FusedMultiplyAdd(2f / 9, z, 2f / 7);
        p = MathF.FusedMultiplyAdd(p, z, 2f / 5);
        p = MathF.FusedMultiplyAdd(p, z, 2f / 3);
        p = MathF.FusedMultiplyAdd(p, z, 2f);
        float kf = k;
        return MathF.FusedMultiplyAdd(kf, Ln2High, MathF.FusedMultiplyAdd(kf, Ln2Low, s * p));
    }

    /// <summary>
    /// sin and cos of 2 pi t, t = (a + 1/2) 2^-24 for 24-bit integers a in [0, 2^24). The top two bits
    /// of a pick the quadrant; the low 22 give w = (r + 1/2) 2^-22 - 1/2 exactly and x = w pi/2 in
    /// (-pi/4, pi/4); sin/cos(x + pi/4) = (sin x +- cos x) / sqrt 2 with Taylor series to x^9 and x^10
    /// (remainders below 2e-9 and 2e-10).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static (Vector256<float> Sin, Vector256<float> Cos) SinCosOfTurn(Vector256<int> a)
    {
        Vector256<int> quadrant = Vector256.ShiftRightLogical(a, 22);
        Vector256<float> r = Vector256.ConvertToSingle(a & Vector256.Create((1 << 22) - 1));
        Vector256<float> w = Vector256.FusedMultiplyAdd(r, Vector256.Create(1f / (1 << 22)), Vector256.Create((1f / (1 << 23)) - 0.5f));
        Vector256<float> x = w * Vector256.Create(HalfPi);
        Vector256<float> z = x * x;

        Vector256<float> sp = Vector256.FusedMultiplyAdd(Vector256.Create(1f / 362880), z, Vector256.Create(-1f / 5040));
        sp = Vector256.FusedMultiplyAdd(sp, z, Vector256.Create(1f / 120));
        sp = Vector256.FusedMultiplyAdd(sp, z, Vector256.Create(-1f / 6));
        Vector256<float> sinX = Vector256.FusedMultiplyAdd(sp * z, x, x);

        Vector256<float> cp = Vector256.FusedMultiplyAdd(Vector256.Create(-1f / 3628800), z, Vector256.Create(1f / 40320));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(-1f / 720));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(1f / 24));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(-0.5f));
        Vector256<float> cosX = Vector256.FusedMultiplyAdd(cp, z, Vector256<float>.One);

        Vector256<float> sqrtHalf = Vector256.Create(0.707106781f);
        Vector256<float> s = (sinX + cosX) * sqrtHalf;
        Vector256<float> c = (cosX - sinX) * sqrtHalf;

        // Quadrant q adds q pi/2: (sin, cos) -> q=1 (c, -s), q=2 (-s, -c), q=3 (-c, s).
        Vector256<float> odd = Vector256.Equals(quadrant & Vector256<int>.One, Vector256<int>.One).AsSingle();
        Vector256<float> sinOut = Vector256.ConditionalSelect(odd, c, s);
        Vector256<float> cosOut = Vector256.ConditionalSelect(odd, s, c);
        Vector256<float> sinNegative = Vector256.GreaterThanOrEqual(quadrant, Vector256.Create(2)).AsSingle();
        Vector256<float> cosNegative = (Vector256.Equals(quadrant, Vector256<int>.One) | Vector256.Equals(quadrant, Vector256.Create(2))).AsSingle();
        Vector256<float> signBit = Vector256.Create(-0f);
        return (sinOut ^ (sinNegative & signBit), cosOut ^ (cosNegative & signBit));
    }

    /// <summary>The scalar twin of <see cref="SinCosOfTurn(Vector256{int})"/> (identical bits).</summary>
    public static (float Sin, float Cos) SinCosOfTurn(int a)
    {
        int quadrant = (int)((uint)a >> 22);
        float r = a & ((1 << 22) - 1);
        float w = MathF.FusedMultiplyAdd(r, 1f / (1 << 22), (1f / (1 << 23)) - 0.5f);
        float x = w * HalfPi;
        float z = x * x;

        float sp = MathF.FusedMultiplyAdd(1f / 362880, z, -1f / 5040);
        sp = MathF.FusedMultiplyAdd(sp, z, 1f / 120);
        sp = MathF.FusedMultiplyAdd(sp, z, -1f / 6);
        float sinX = MathF.FusedMultiplyAdd(sp * z, x, x);

        float cp = MathF.FusedMultiplyAdd(-1f / 3628800, z, 1f / 40320);
        cp = MathF.FusedMultiplyAdd(cp, z, -1f / 720);
        cp = MathF.FusedMultiplyAdd(cp, z, 1f / 24);
        cp = MathF.FusedMultiplyAdd(cp, z, -0.5f);
        float cosX = MathF.FusedMultiplyAdd(cp, z, 1f);

        const float sqrtHalf = 0.707106781f;
        float s = (sinX + cosX) * sqrtHalf;
        float c = (cosX - sinX) * sqrtHalf;
        float sinOut = (quadrant & 1) == 1 ? c : s;
        float cosOut = (quadrant & 1) == 1 ? s : c;
        return (quadrant >= 2 ? -sinOut : sinOut, quadrant is 1 or 2 ? -cosOut : cosOut);
    }

    // The 512-bit forms below are the 256-bit ones above at twice the width, operation for operation
    // (there is no public generic vector interface to write them once): identical bits per lane.

    /// <summary><see cref="Log(Vector256{float})"/> on sixteen lanes (identical bits).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector512<float> Log(Vector512<float> x)
    {
        Vector512<int> bits = x.AsInt32();
        Vector512<int> k = Vector512.ShiftRightArithmetic(bits - Vector512.Create(SqrtHalfBits), 23);
        Vector512<float> f = (bits - Vector512.ShiftLeft(k, 23)).AsSingle();
        Vector512<float> one = Vector512<float>.One;
        Vector512<float> s = (f - one) / (f + one);
        Vector512<float> z = s * s;
        Vector512<float> p = Vector512.FusedMultiplyAdd(Vector512.Create(2f / 9), z, Vector512.Create(2f / 7));
        p = Vector512.FusedMultiplyAdd(p, z, Vector512.Create(2f / 5));
        p = Vector512.FusedMultiplyAdd(p, z, Vector512.Create(2f / 3));
        p = Vector512.FusedMultiplyAdd(p, z, Vector512.Create(2f));
        Vector512<float> kf = Vector512.ConvertToSingle(k);
        return Vector512.FusedMultiplyAdd(kf, Vector512.Create(Ln2High), Vector512.FusedMultiplyAdd(kf, Vector512.Create(Ln2Low), s * p));
    }

    /// <summary><see cref="SinCosOfTurn(Vector256{int})"/> on sixteen lanes (identical bits).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static (Vector512<float> Sin, Vector512<float> Cos) SinCosOfTurn(Vector512<int> a)
    {
        Vector512<int> quadrant = Vector512.ShiftRightLogical(a, 22);
        Vector512<float> r = Vector512.ConvertToSingle(a & Vector512.Create((1 << 22) - 1));
        Vector512<float> w = Vector512.FusedMultiplyAdd(r, Vector512.Create(1f / (1 << 22)), Vector512.Create((1f / (1 << 23)) - 0.5f));
        Vector512<float> x = w * Vector512.Create(HalfPi);
        Vector512<float> z = x * x;

        Vector512<float> sp = Vector512.FusedMultiplyAdd(Vector512.Create(1f / 362880), z, Vector512.Create(-1f / 5040));
        sp = Vector512.FusedMultiplyAdd(sp, z, Vector512.Create(1f / 120));
        sp = Vector512.FusedMultiplyAdd(sp, z, Vector512.Create(-1f / 6));
        Vector512<float> sinX = Vector512.FusedMultiplyAdd(sp * z, x, x);

        Vector512<float> cp = Vector512.FusedMultiplyAdd(Vector512.Create(-1f / 3628800), z, Vector512.Create(1f / 40320));
        cp = Vector512.FusedMultiplyAdd(cp, z, Vector512.Create(-1f / 720));
        cp = Vector512.FusedMultiplyAdd(cp, z, Vector512.Create(1f / 24));
        cp = Vector512.FusedMultiplyAdd(cp, z, Vector512.Create(-0.5f));
        Vector512<float> cosX = Vector512.FusedMultiplyAdd(cp, z, Vector512<float>.One);

        Vector512<float> sqrtHalf = Vector512.Create(0.707106781f);
        Vector512<float> s = (sinX + cosX) * sqrtHalf;
        Vector512<float> c = (cosX - sinX) * sqrtHalf;

        // Quadrant q adds q pi/2: (sin, cos) -> q=1 (c, -s), q=2 (-s, -c), q=3 (-c, s).
        Vector512<float> odd = Vector512.Equals(quadrant & Vector512<int>.One, Vector512<int>.One).AsSingle();
        Vector512<float> sinOut = Vector512.ConditionalSelect(odd, c, s);
        Vector512<float> cosOut = Vector512.ConditionalSelect(odd, s, c);
        Vector512<float> sinNegative = Vector512.GreaterThanOrEqual(quadrant, Vector512.Create(2)).AsSingle();
        Vector512<float> cosNegative = (Vector512.Equals(quadrant, Vector512<int>.One) | Vector512.Equals(quadrant, Vector512.Create(2))).AsSingle();
        Vector512<float> signBit = Vector512.Create(-0f);
        return (sinOut ^ (sinNegative & signBit), cosOut ^ (cosNegative & signBit));
    }
}

using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Random;

/// <summary>
/// The two transcendental steps of the vector Box-Muller kernel on exactly the domains it needs,
/// cheaper than the general Vector256.Log / SinCos (no special values, no large-argument reduction).
/// Both are truncated Taylor series of textbook identities (common practice), accurate to about
/// 1e-15; the tests hold them to Math.Log / Sin / Cos.
/// </summary>
internal static class FastMath256
{
    private const double Ln2 = 0.6931471805599453;         // ln 2 rounded to double
    private const long SqrtHalfBits = 0x3FE6A09E667F3BCD;  // bits of sqrt(1/2)
    private const ulong LowFiftyBits = (1UL << 50) - 1;
    private const ulong ExponentOfOne = 0x3FF0000000000000UL;

    /// <summary>
    /// ln u for any positive, finite, normal u (the kernel's uniforms in [2^-53, 1) and the sketch's
    /// position errors above 1e-9 m; not for zero, subnormals, infinities or NaN): u = 2^k f with f in [sqrt(1/2), sqrt(2)), ln f = 2 atanh(s),
    /// s = (f - 1) / (f + 1), |s| &lt;= 0.1716, the series 2 (s + s^3/3 + ... + s^17/17) leaves a relative
    /// error below 1e-15 (next term 2 s^19 / 19).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector256<double> LogOfPositive(Vector256<double> u)
    {
        Vector256<long> bits = u.AsInt64();
        Vector256<long> k = Vector256.ShiftRightArithmetic(bits - Vector256.Create(SqrtHalfBits), 52);
        Vector256<double> f = (bits - Vector256.ShiftLeft(k, 52)).AsDouble();
        Vector256<double> one = Vector256<double>.One;
        Vector256<double> s = (f - one) / (f + one);
        Vector256<double> z = s * s;
        Vector256<double> p = Vector256.Create(2.0 / 17);
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2.0 / 15));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2.0 / 13));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2.0 / 11));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2.0 / 9));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2.0 / 7));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2.0 / 5));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2.0 / 3));
        p = Vector256.FusedMultiplyAdd(p, z, Vector256.Create(2.0));
        return Vector256.FusedMultiplyAdd(Vector256.ConvertToDouble(k), Vector256.Create(Ln2), s * p);
    }

    /// <summary>
    /// sin and cos of the angle 2 pi u with u = (m + 1/2) 2^-52, m = bits >> 12 (the uniform of
    /// <see cref="CounterRng.UniformFromBits"/>). The top two bits of m pick the quadrant; the other 50
    /// give x in [-pi/4, pi/4] exactly up to one rounding, and sin/cos(x + pi/4) = (sin x +- cos x) / sqrt 2
    /// with Taylor series to x^15 and x^16 (remainders below 5e-17 and 1e-15).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static (Vector256<double> Sin, Vector256<double> Cos) SinCosOfTurn(Vector256<ulong> bits)
    {
        Vector256<ulong> m = bits >> 12;
        Vector256<ulong> quadrant = m >> 50;
        // w = (r + 1/2) 2^-50 - 1/2 exactly, r the low 50 bits of m: the position within the quadrant.
        Vector256<double> w = (((m & Vector256.Create(LowFiftyBits)) << 2) | Vector256.Create(ExponentOfOne)).AsDouble()
            - Vector256.Create(1.5 - (1.0 / (1UL << 51)));
        Vector256<double> x = w * Vector256.Create(Math.PI / 2);
        Vector256<double> z = x * x;

        Vector256<double> sp = Vector256.Create(-1.0 / 1307674368000);
        sp = Vector256.FusedMultiplyAdd(sp, z, Vector256.Create(1.0 / 6227020800));
        sp = Vector256.FusedMultiplyAdd(sp, z, Vector256.Create(-1.0 / 39916800));
        sp = Vector256.FusedMultiplyAdd(sp, z, Vector256.Create(1.0 / 362880));
        sp = Vector256.FusedMultiplyAdd(sp, z, Vector256.Create(-1.0 / 5040));
        sp = Vector256.FusedMultiplyAdd(sp, z, Vector256.Create(1.0 / 120));
        sp = Vector256.FusedMultiplyAdd(sp, z, Vector256.Create(-1.0 / 6));
        Vector256<double> sinX = Vector256.FusedMultiplyAdd(sp * z, x, x);

        Vector256<double> cp = Vector256.Create(1.0 / 20922789888000);
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(-1.0 / 87178291200));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(1.0 / 479001600));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(-1.0 / 3628800));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(1.0 / 40320));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(-1.0 / 720));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(1.0 / 24));
        cp = Vector256.FusedMultiplyAdd(cp, z, Vector256.Create(-0.5));
        Vector256<double> cosX = Vector256.FusedMultiplyAdd(cp, z, Vector256<double>.One);

        Vector256<double> sqrtHalf = Vector256.Create(Math.Sqrt(0.5));
        Vector256<double> s = (sinX + cosX) * sqrtHalf; // sin of the angle within the quadrant
        Vector256<double> c = (cosX - sinX) * sqrtHalf; // its cosine

        // Quadrant q adds q pi/2: (sin, cos) -> q=1 (c, -s), q=2 (-s, -c), q=3 (-c, s).
        Vector256<double> odd = Vector256.Equals(quadrant & Vector256<ulong>.One, Vector256<ulong>.One).AsDouble();
        Vector256<double> sinOut = Vector256.ConditionalSelect(odd, c, s);
        Vector256<double> cosOut = Vector256.ConditionalSelect(odd, s, c);
        Vector256<double> sinNegative = Vector256.GreaterThanOrEqual(quadrant, Vector256.Create(2UL)).AsDouble();
        Vector256<double> cosNegative = Vector256.Equals(quadrant, Vector256<ulong>.One).AsDouble()
            | Vector256.Equals(quadrant, Vector256.Create(2UL)).AsDouble();
        Vector256<double> signBit = Vector256.Create(-0.0);
        return (sinOut ^ (sinNegative & signBit), cosOut ^ (cosNegative & signBit));
    }
}

using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace ErrorBudget.Core.Random;

/// <summary>
/// 64-bit bijective mixers (xor-shift-multiply finalizers). Each is a bijection on 64-bit words,
/// so distinct inputs always give distinct outputs, and one flipped input bit changes about half
/// of the output bits.
/// </summary>
internal static class Mix64
{
    /// <summary>The golden-ratio Weyl increment 2^64 / phi, odd (SplitMix64).</summary>
    public const ulong Golden = 0x9E3779B97F4A7C15UL;

    /// <summary>
    /// The SplitMix64 finalizer ("Mix13" variant of the MurmurHash3 finalizer, shifts 30/27/31).
    /// Source: Steele, Lea &amp; Flood, "Fast splittable pseudorandom number generators",
    /// OOPSLA 2014, and the public SplitMix64 reference code (from memory).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong SplitMix(ulong z)
    {
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }

    /// <summary>
    /// The "Moremur" mixer (shifts 27/33/27), tuned to stay strong on poorly spaced inputs.
    /// Source: P. Evensen, "Better, stronger mixer and a test procedure", 2019 (from memory).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong Moremur(ulong x)
    {
        x = (x ^ (x >> 27)) * 0x3C79AC492BA7B653UL;
        x = (x ^ (x >> 33)) * 0x1C69B3F74AC4AE35UL;
        return x ^ (x >> 27);
    }

    /// <summary>Lane-wise <see cref="SplitMix"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector256<ulong> SplitMix(Vector256<ulong> z)
    {
        z = (z ^ (z >> 30)) * Vector256.Create(0xBF58476D1CE4E5B9UL);
        z = (z ^ (z >> 27)) * Vector256.Create(0x94D049BB133111EBUL);
        return z ^ (z >> 31);
    }

    /// <summary>Lane-wise <see cref="Moremur"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector256<ulong> Moremur(Vector256<ulong> x)
    {
        x = (x ^ (x >> 27)) * Vector256.Create(0x3C79AC492BA7B653UL);
        x = (x ^ (x >> 33)) * Vector256.Create(0x1C69B3F74AC4AE35UL);
        return x ^ (x >> 27);
    }

    /// <summary><see cref="SplitMix(Vector256{ulong})"/> on eight lanes.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector512<ulong> SplitMix(Vector512<ulong> z)
    {
        z = (z ^ (z >> 30)) * Vector512.Create(0xBF58476D1CE4E5B9UL);
        z = (z ^ (z >> 27)) * Vector512.Create(0x94D049BB133111EBUL);
        return z ^ (z >> 31);
    }

    /// <summary><see cref="Moremur(Vector256{ulong})"/> on eight lanes.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Vector512<ulong> Moremur(Vector512<ulong> x)
    {
        x = (x ^ (x >> 27)) * Vector512.Create(0x3C79AC492BA7B653UL);
        x = (x ^ (x >> 33)) * Vector512.Create(0x1C69B3F74AC4AE35UL);
        return x ^ (x >> 27);
    }
}

using System.Runtime.CompilerServices;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// A sum that does not depend on the order of its terms: each term is rounded to a multiple of 2^-50 and added as a
/// 128-bit integer, so any split of the samples into blocks gives the same bits. Terms up to ~1e20 in magnitude, sums
/// up to ~1e23 (2^127 / 2^50); resolution 8.9e-16 in the term's unit.
/// </summary>
internal struct FixedPointSum
{
    private const double Scale = 1125899906842624.0; // 2^50
    private Int128 _sum;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Add(double term) => _sum += (Int128)Math.Round(term * Scale);

    /// <summary>Adds <paramref name="term"/> <paramref name="times"/> times (exactly: the rounded term times the count).</summary>
    public void Add(double term, long times) => _sum += (Int128)Math.Round(term * Scale) * times;

    public readonly double Value => (double)_sum / Scale;
}

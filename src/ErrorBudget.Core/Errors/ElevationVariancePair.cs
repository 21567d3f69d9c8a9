using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// The truth and the assumed user-error tables interleaved node by node, so the geometry step finds
/// both variances of a satellite with one index and one cache line instead of two lookups into two
/// 32 KiB tables (the tables' lookups were 2 - 3.5 % of W1's profile). Each value is, bit for bit, what
/// <see cref="ElevationVarianceTable.At"/> of its table gives (the same nodes and operations; a test
/// holds them to it).
/// </summary>
internal sealed class ElevationVariancePair
{
    private const int Intervals = ElevationVarianceTable.Intervals;

    private readonly double[] _nodes = new double[2 * (Intervals + 2)]; // [2 i] truth, [2 i + 1] assumed

    public ElevationVariancePair(ElevationVarianceTable truth, ElevationVarianceTable assumed)
    {
        ArgumentNullException.ThrowIfNull(truth);
        ArgumentNullException.ThrowIfNull(assumed);
        for (int i = 0; i <= Intervals + 1; i++)
        {
            _nodes[2 * i] = truth.Node(i);
            _nodes[(2 * i) + 1] = assumed.Node(i);
        }
    }

    /// <summary>Both range variances, m^2, at sin(elevation). Range: [0, 1] (clamped).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void At(double sinElevation, out double truth, out double assumed)
    {
        double x = Math.Clamp(sinElevation, 0.0, 1.0) * Intervals;
        int i = (int)x;
        double f = x - i;
        // i <= Intervals, so nodes 2 i .. 2 i + 3 lie inside the array (node Intervals + 1 is the pad).
        ref double node = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_nodes), 2 * i);
        double t0 = node, a0 = Unsafe.Add(ref node, 1), t1 = Unsafe.Add(ref node, 2), a1 = Unsafe.Add(ref node, 3);
        truth = t0 + f * (t1 - t0);
        assumed = a0 + f * (a1 - a0);
    }
}

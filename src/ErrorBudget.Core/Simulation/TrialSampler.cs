using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The hot loop over the trials of one (epoch, user): position error from the satellite-level
/// errors through the coefficients, plus the user-level part L z, then HPE and VPE into the
/// cell's and the epoch's sketches. Two twins give the same answers (a test holds them to it):
/// <see cref="SampleVector"/> computes four trials per Vector256 (lanes = trials, the padded lanes
/// of the last vector are computed and discarded), <see cref="SampleScalar"/> one at a time.
/// </summary>
internal static class TrialSampler
{
    public static bool VectorPathAvailable => Vector256.IsHardwareAccelerated;

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void SampleVector(int m, int trials, double[] satErrors, CellAccumulator acc, long weight, TileScratch s)
    {
        int stride = s.LaneCapacity;
        ref double err = ref MemoryMarshal.GetArrayDataReference(satErrors);
        ref double coef = ref MemoryMarshal.GetArrayDataReference(s.Coefficients);
        ref double z = ref MemoryMarshal.GetArrayDataReference(s.Normals);
        ReadOnlySpan<int> visible = s.Visible.AsSpan(0, m);
        double[] l = s.Cholesky3;
        var l0 = Vector256.Create(l[0]);
        var l3 = Vector256.Create(l[3]);
        var l4 = Vector256.Create(l[4]);
        var l6 = Vector256.Create(l[6]);
        var l7 = Vector256.Create(l[7]);
        var l8 = Vector256.Create(l[8]);
        var inverseLnGamma = Vector256.Create(acc.Hpe.InverseLnGamma);
        var minIndexable = Vector256.Create(DDSketch.MinIndexable);
        Span<int> keysH = s.KeysH;
        Span<int> keysV = s.KeysV;
        var e0 = Vector256.Create(s.CommonOffset[0]);
        var n0 = Vector256.Create(s.CommonOffset[1]);
        var u0 = Vector256.Create(s.CommonOffset[2]);
        IntegrityScratch? values = s.Integrity;

        // One vector (four trials) per step. Two vectors per step with shared broadcasts measured no
        // faster (A/B in a scratch program, 2026-12-01): the loop is bound by its loads, not latency.
        for (int j = 0; j < trials; j += Vector256<double>.Count)
        {
            var e = e0;
            var n = n0;
            var u = u0;
            for (int i = 0; i < m; i++)
            {
                int b = visible[i] * 4 * stride + j;
                var x0 = Vector256.LoadUnsafe(ref err, (nuint)b);
                var x1 = Vector256.LoadUnsafe(ref err, (nuint)(b + stride));
                var x2 = Vector256.LoadUnsafe(ref err, (nuint)(b + 2 * stride));
                var x3 = Vector256.LoadUnsafe(ref err, (nuint)(b + 3 * stride));
                ref double c = ref Unsafe.Add(ref coef, i * 8);
                var range = Vector256.FusedMultiplyAdd(x0, Vector256.Create(c), x3);
                range = Vector256.FusedMultiplyAdd(x1, Vector256.Create(Unsafe.Add(ref c, 1)), range);
                range = Vector256.FusedMultiplyAdd(x2, Vector256.Create(Unsafe.Add(ref c, 2)), range);
                e = Vector256.FusedMultiplyAdd(range, Vector256.Create(Unsafe.Add(ref c, 3)), e);
                n = Vector256.FusedMultiplyAdd(range, Vector256.Create(Unsafe.Add(ref c, 4)), n);
                u = Vector256.FusedMultiplyAdd(range, Vector256.Create(Unsafe.Add(ref c, 5)), u);
            }

            Finish(e, n, u, ref z, j, stride, l0, l3, l4, l6, l7, l8, inverseLnGamma, minIndexable, keysH, keysV, values);
        }

        AddAll(acc, weight, s, trials);
    }

    /// <summary>Adds L z to four trials' satellite-level position errors and writes their HPE and VPE sketch keys.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Finish(
        Vector256<double> e, Vector256<double> n, Vector256<double> u, ref double z, int j, int stride,
        Vector256<double> l0, Vector256<double> l3, Vector256<double> l4, Vector256<double> l6, Vector256<double> l7, Vector256<double> l8,
        Vector256<double> inverseLnGamma, Vector256<double> minIndexable, Span<int> keysH, Span<int> keysV, IntegrityScratch? values)
    {
        var z0 = Vector256.LoadUnsafe(ref z, (nuint)j);
        var z1 = Vector256.LoadUnsafe(ref z, (nuint)(stride + j));
        var z2 = Vector256.LoadUnsafe(ref z, (nuint)(2 * stride + j));
        e = Vector256.FusedMultiplyAdd(l0, z0, e);
        n = Vector256.FusedMultiplyAdd(l3, z0, Vector256.FusedMultiplyAdd(l4, z1, n));
        u = Vector256.FusedMultiplyAdd(l6, z0, Vector256.FusedMultiplyAdd(l7, z1, Vector256.FusedMultiplyAdd(l8, z2, u)));
        var hpe = Vector256.Sqrt(Vector256.FusedMultiplyAdd(e, e, n * n));
        var vpe = Vector256.Abs(u);
        VectorKeys(hpe, inverseLnGamma, minIndexable, keysH.Slice(j, Vector256<double>.Count));
        VectorKeys(vpe, inverseLnGamma, minIndexable, keysV.Slice(j, Vector256<double>.Count));
        if (values is not null)
        {
            hpe.StoreUnsafe(ref MemoryMarshal.GetArrayDataReference(values.HpeValues), (nuint)j);
            vpe.StoreUnsafe(ref MemoryMarshal.GetArrayDataReference(values.VpeValues), (nuint)j);
        }
    }

    /// <summary>The block's keys into the cell's sketches (weight 1) and the epoch share (area weight); padded lanes are left out.</summary>
    internal static void AddAll(CellAccumulator acc, long weight, TileScratch s, int trials)
    {
        long start = s.Stages is null ? 0 : StageClock.Now;
        AddKeys(acc, weight, s, trials);
        if (s.Stages is { } clock)
        {
            clock.Sketches += StageClock.Now - start;
        }
    }

    private static void AddKeys(CellAccumulator acc, long weight, TileScratch s, int trials)
    {
        ReadOnlySpan<int> h = s.KeysH.AsSpan(0, trials);
        ReadOnlySpan<int> v = s.KeysV.AsSpan(0, trials);
        if (s.Batches == 1)
        {
            DDSketch.AddKeysToBoth(h, acc.Hpe, 1, s.Hpe, weight);
            DDSketch.AddKeysToBoth(v, acc.Vpe, 1, s.Vpe, weight);
            return;
        }

        ReadOnlySpan<int> ends = s.SegmentEnds.AsSpan(0, s.SegmentCount);
        DDSketch.AddKeysSegmented(h, acc.Hpe, 1, s.Hpe, weight, ends, s.HpeRun.AsSpan(s.FirstSegmentBatch, s.SegmentCount));
        DDSketch.AddKeysSegmented(v, acc.Vpe, 1, s.Vpe, weight, ends, s.VpeRun.AsSpan(s.FirstSegmentBatch, s.SegmentCount));
    }

    /// <summary>Sketch keys ceil(ln x / ln gamma) of four values, the zero key at or below MinIndexable.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void VectorKeys(Vector256<double> x, Vector256<double> inverseLnGamma, Vector256<double> minIndexable, Span<int> keys)
    {
        var positive = Vector256.GreaterThan(x, minIndexable);
        var safe = Vector256.ConditionalSelect(positive, x, Vector256<double>.One);
        var k = Vector256.ConvertToInt64(Vector256.Ceiling(Random.FastMath256.LogOfPositive(safe) * inverseLnGamma));
        k = Vector256.ConditionalSelect(positive.AsInt64(), k, Vector256.Create((long)DDSketch.ZeroKey));
        // Keys fit in 32 bits (|ln x| / ln gamma < 2^31 for every double): narrowing keeps them exactly.
        Vector256.Narrow(k, k).GetLower().StoreUnsafe(ref MemoryMarshal.GetReference(keys));
    }

    /// <summary>The scalar twin of <see cref="SampleVector"/>: the same fused operations, one trial at a time.</summary>
    public static void SampleScalar(int m, int trials, double[] satErrors, CellAccumulator acc, long weight, TileScratch s)
    {
        int stride = s.LaneCapacity;
        ReadOnlySpan<double> coef = s.Coefficients.AsSpan(0, 8 * m);
        ReadOnlySpan<int> visible = s.Visible.AsSpan(0, m);
        ReadOnlySpan<double> l = s.Cholesky3;
        ReadOnlySpan<double> z = s.Normals;
        DDSketch mapping = acc.Hpe;
        double e0 = s.CommonOffset[0], n0 = s.CommonOffset[1], u0 = s.CommonOffset[2];
        for (int j = 0; j < trials; j++)
        {
            double e = e0, n = n0, u = u0;
            for (int i = 0; i < m; i++)
            {
                int b = visible[i] * 4 * stride + j;
                double x0 = satErrors[b], x1 = satErrors[b + stride], x2 = satErrors[b + 2 * stride], x3 = satErrors[b + 3 * stride];
                int c = i * 8;
                double range = Math.FusedMultiplyAdd(x2, coef[c + 2], Math.FusedMultiplyAdd(x1, coef[c + 1], Math.FusedMultiplyAdd(x0, coef[c], x3)));
                e = Math.FusedMultiplyAdd(range, coef[c + 3], e);
                n = Math.FusedMultiplyAdd(range, coef[c + 4], n);
                u = Math.FusedMultiplyAdd(range, coef[c + 5], u);
            }

            double z0 = z[j], z1 = z[stride + j], z2 = z[2 * stride + j];
            e = Math.FusedMultiplyAdd(l[0], z0, e);
            n = Math.FusedMultiplyAdd(l[3], z0, Math.FusedMultiplyAdd(l[4], z1, n));
            u = Math.FusedMultiplyAdd(l[6], z0, Math.FusedMultiplyAdd(l[7], z1, Math.FusedMultiplyAdd(l[8], z2, u)));

            // The same operations in the same order as the vector twin: identical values, only the
            // logarithm of the sketch key may differ in the last bits (FastMath256 vs Math.Log).
            double hpe = Math.Sqrt(Math.FusedMultiplyAdd(e, e, n * n));
            double vpe = Math.Abs(u);
            s.KeysH[j] = mapping.KeyOf(hpe);
            s.KeysV[j] = mapping.KeyOf(vpe);
            if (s.Integrity is { } values)
            {
                values.HpeValues[j] = hpe;
                values.VpeValues[j] = vpe;
            }
        }

        AddAll(acc, weight, s, trials);
    }
}

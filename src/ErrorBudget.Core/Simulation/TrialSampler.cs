using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The hot loop over the trials of one (epoch, user): position error from the satellite-level
/// errors through the coefficients, plus the user-level part L z, then HPE and VPE into the
/// cell's and the epoch's sketches. Two twins give identical answers (a test holds them to it):
/// <see cref="SampleVector"/> computes eight trials per Vector256 of float (lanes = trials, the padded
/// lanes of the last vector are computed and discarded), <see cref="SampleScalar"/> one at a time
/// with the same operations.
/// </summary>
/// <remarks>
/// Single precision (issue 6). The inputs are float: satellite errors with each trial's all-satellite
/// mean clock error removed (<see cref="EpochWork.FillSingle"/>; a common range error moves no
/// position, since every row of S sums to zero over the satellites), coefficients, L and the normals.
/// Each of the ~4 m + 6 fused steps rounds to 2^-24 relative, so an error of size x is computed to
/// about (m + 3) 2^-24 of the sum of its terms' magnitudes: ~1e-6 relative for position errors of the
/// size of the range errors, a five-thousandth of the sketch's 0.5 % bucket (the float logarithm adds
/// a few 1e-7 more). A large error that mostly cancels inside S (e.g. one shell kilometres off with
/// another in view) keeps the absolute error ~1e-6 of its terms: metres to millimetres.
/// </remarks>
internal static class TrialSampler
{
    public static bool VectorPathAvailable => Vector256.IsHardwareAccelerated;

    /// <summary>Sixteen trials per Vector512 of float where the hardware accelerates it.</summary>
    public static bool WidePathAvailable => Vector512.IsHardwareAccelerated;

    /// <summary>HPE and VPE at or below this go to the zero bucket (<see cref="SimulationSetup.PositionErrorResolutionMeters"/>).</summary>
    private const float Resolution = (float)SimulationSetup.PositionErrorResolutionMeters;

    /// <summary>Trials per vector step of the 256-bit path.</summary>
    public const int Lanes = 8;

    /// <summary>Trials per vector step of the 512-bit path.</summary>
    public const int WideLanes = 16;

    /// <summary>
    /// The vector path for a block: 512-bit when accelerated and the scratch's lanes hold the trials
    /// rounded up to 16, else 256-bit. Both give the same bits.
    /// </summary>
    public static bool UsesWidePath(int trials, TileScratch s) =>
        WidePathAvailable && RoundUp(trials, WideLanes) <= s.LaneCapacity;

    /// <summary>The lanes <see cref="SampleVector"/> computes (and needs normals for): trials rounded up to its vector.</summary>
    public static int VectorLanes(int trials, TileScratch s) => RoundUp(trials, UsesWidePath(trials, s) ? WideLanes : Lanes);

    private static int RoundUp(int n, int multiple) => (n + multiple - 1) / multiple * multiple;

    /// <summary>
    /// The vector twin: <see cref="SampleWide"/> where <see cref="UsesWidePath"/>, else eight trials per
    /// Vector256. Needs the normals of <see cref="VectorLanes"/> lanes.
    /// </summary>
    public static void SampleVector(int m, int trials, float[] satErrors, CellAccumulator acc, long weight, TileScratch s)
    {
        if (UsesWidePath(trials, s))
        {
            SampleWide(m, trials, satErrors, acc, weight, s);
        }
        else
        {
            SampleNarrow(m, trials, satErrors, acc, weight, s);
        }
    }

    /// <summary>Eight trials per Vector256 of float (lanes = trials rounded up to 8).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void SampleNarrow(int m, int trials, float[] satErrors, CellAccumulator acc, long weight, TileScratch s)
    {
        int stride = s.LaneCapacity;
        ref float err = ref MemoryMarshal.GetArrayDataReference(satErrors);
        ref float coef = ref MemoryMarshal.GetArrayDataReference(s.Coefficients);
        ref float z = ref MemoryMarshal.GetArrayDataReference(s.Normals);
        ReadOnlySpan<int> visible = s.Visible.AsSpan(0, m);
        float[] l = s.CholeskySingle;
        var l0 = Vector256.Create(l[0]);
        var l3 = Vector256.Create(l[3]);
        var l4 = Vector256.Create(l[4]);
        var l6 = Vector256.Create(l[6]);
        var l7 = Vector256.Create(l[7]);
        var l8 = Vector256.Create(l[8]);
        var inverseLnGamma = Vector256.Create((float)acc.Hpe.InverseLnGamma);
        var minIndexable = Vector256.Create(Resolution);
        ref int keysH = ref MemoryMarshal.GetArrayDataReference(s.KeysH);
        ref int keysV = ref MemoryMarshal.GetArrayDataReference(s.KeysV);
        var e0 = Vector256.Create(s.OffsetSingle[0]);
        var n0 = Vector256.Create(s.OffsetSingle[1]);
        var u0 = Vector256.Create(s.OffsetSingle[2]);
        IntegrityScratch? values = s.Integrity;

        for (int j = 0; j < trials; j += Lanes)
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
                ref float c = ref Unsafe.Add(ref coef, i * 8);
                var range = Vector256.FusedMultiplyAdd(x0, Vector256.Create(c), x3);
                range = Vector256.FusedMultiplyAdd(x1, Vector256.Create(Unsafe.Add(ref c, 1)), range);
                range = Vector256.FusedMultiplyAdd(x2, Vector256.Create(Unsafe.Add(ref c, 2)), range);
                e = Vector256.FusedMultiplyAdd(range, Vector256.Create(Unsafe.Add(ref c, 3)), e);
                n = Vector256.FusedMultiplyAdd(range, Vector256.Create(Unsafe.Add(ref c, 4)), n);
                u = Vector256.FusedMultiplyAdd(range, Vector256.Create(Unsafe.Add(ref c, 5)), u);
            }

            var z0 = Vector256.LoadUnsafe(ref z, (nuint)j);
            var z1 = Vector256.LoadUnsafe(ref z, (nuint)(stride + j));
            var z2 = Vector256.LoadUnsafe(ref z, (nuint)(2 * stride + j));
            e = Vector256.FusedMultiplyAdd(l0, z0, e);
            n = Vector256.FusedMultiplyAdd(l3, z0, Vector256.FusedMultiplyAdd(l4, z1, n));
            u = Vector256.FusedMultiplyAdd(l6, z0, Vector256.FusedMultiplyAdd(l7, z1, Vector256.FusedMultiplyAdd(l8, z2, u)));
            var hpe = Vector256.Sqrt(Vector256.FusedMultiplyAdd(e, e, n * n));
            var vpe = Vector256.Abs(u);
            VectorKeys(hpe, inverseLnGamma, minIndexable).StoreUnsafe(ref keysH, (nuint)j);
            VectorKeys(vpe, inverseLnGamma, minIndexable).StoreUnsafe(ref keysV, (nuint)j);
            if (values is not null)
            {
                StoreWide(hpe, values.HpeValues, j);
                StoreWide(vpe, values.VpeValues, j);
            }
        }

        AddAll(acc, weight, s, trials);
    }

    /// <summary>
    /// Sixteen trials per Vector512 of float (lanes = trials rounded up to 16): <see cref="SampleNarrow"/>
    /// at twice the width, operation for operation per lane (no public generic vector interface to write
    /// it once), software-pipelined: the satellite sums of the next 16 trials are issued before this
    /// step's square root and logarithms, so the two dependency chains overlap (one (epoch, user) of 9
    /// satellites and 100 trials with its inserts ~9 % faster over eight alternating scratch runs,
    /// 2026-12-03; two vectors per pass over the satellites instead did not pay).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void SampleWide(int m, int trials, float[] satErrors, CellAccumulator acc, long weight, TileScratch s)
    {
        int stride = s.LaneCapacity;
        ref float err = ref MemoryMarshal.GetArrayDataReference(satErrors);
        ref float coef = ref MemoryMarshal.GetArrayDataReference(s.Coefficients);
        ref float z = ref MemoryMarshal.GetArrayDataReference(s.Normals);
        ReadOnlySpan<int> visible = s.Visible.AsSpan(0, m);
        float[] l = s.CholeskySingle;
        var l0 = Vector512.Create(l[0]);
        var l3 = Vector512.Create(l[3]);
        var l4 = Vector512.Create(l[4]);
        var l6 = Vector512.Create(l[6]);
        var l7 = Vector512.Create(l[7]);
        var l8 = Vector512.Create(l[8]);
        var inverseLnGamma = Vector512.Create((float)acc.Hpe.InverseLnGamma);
        var minIndexable = Vector512.Create(Resolution);
        ref int keysH = ref MemoryMarshal.GetArrayDataReference(s.KeysH);
        ref int keysV = ref MemoryMarshal.GetArrayDataReference(s.KeysV);
        var e0 = Vector512.Create(s.OffsetSingle[0]);
        var n0 = Vector512.Create(s.OffsetSingle[1]);
        var u0 = Vector512.Create(s.OffsetSingle[2]);
        IntegrityScratch? values = s.Integrity;

        (Vector512<float> e, Vector512<float> n, Vector512<float> u) = SumWide(m, 0, stride, ref err, ref coef, visible, e0, n0, u0);
        for (int j = 0; j < trials; j += WideLanes)
        {
            var (ne, nn, nu) = j + WideLanes < trials
                ? SumWide(m, j + WideLanes, stride, ref err, ref coef, visible, e0, n0, u0)
                : (e0, n0, u0);
            var z0 = Vector512.LoadUnsafe(ref z, (nuint)j);
            var z1 = Vector512.LoadUnsafe(ref z, (nuint)(stride + j));
            var z2 = Vector512.LoadUnsafe(ref z, (nuint)(2 * stride + j));
            e = Vector512.FusedMultiplyAdd(l0, z0, e);
            n = Vector512.FusedMultiplyAdd(l3, z0, Vector512.FusedMultiplyAdd(l4, z1, n));
            u = Vector512.FusedMultiplyAdd(l6, z0, Vector512.FusedMultiplyAdd(l7, z1, Vector512.FusedMultiplyAdd(l8, z2, u)));
            var hpe = Vector512.Sqrt(Vector512.FusedMultiplyAdd(e, e, n * n));
            var vpe = Vector512.Abs(u);
            VectorKeys512(hpe, inverseLnGamma, minIndexable).StoreUnsafe(ref keysH, (nuint)j);
            VectorKeys512(vpe, inverseLnGamma, minIndexable).StoreUnsafe(ref keysV, (nuint)j);
            if (values is not null)
            {
                StoreWide512(hpe, values.HpeValues, j);
                StoreWide512(vpe, values.VpeValues, j);
            }

            e = ne;
            n = nn;
            u = nu;
        }

        AddAll(acc, weight, s, trials);
    }

    /// <summary>Offset plus the satellite-level errors of trials [j, j + 16) through the coefficients: (E, N, U).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static (Vector512<float>, Vector512<float>, Vector512<float>) SumWide(
        int m, int j, int stride, ref float err, ref float coef, ReadOnlySpan<int> visible, Vector512<float> e, Vector512<float> n, Vector512<float> u)
    {
        for (int i = 0; i < m; i++)
        {
            int b = visible[i] * 4 * stride + j;
            var x0 = Vector512.LoadUnsafe(ref err, (nuint)b);
            var x1 = Vector512.LoadUnsafe(ref err, (nuint)(b + stride));
            var x2 = Vector512.LoadUnsafe(ref err, (nuint)(b + 2 * stride));
            var x3 = Vector512.LoadUnsafe(ref err, (nuint)(b + 3 * stride));
            ref float c = ref Unsafe.Add(ref coef, i * 8);
            var range = Vector512.FusedMultiplyAdd(x0, Vector512.Create(c), x3);
            range = Vector512.FusedMultiplyAdd(x1, Vector512.Create(Unsafe.Add(ref c, 1)), range);
            range = Vector512.FusedMultiplyAdd(x2, Vector512.Create(Unsafe.Add(ref c, 2)), range);
            e = Vector512.FusedMultiplyAdd(range, Vector512.Create(Unsafe.Add(ref c, 3)), e);
            n = Vector512.FusedMultiplyAdd(range, Vector512.Create(Unsafe.Add(ref c, 4)), n);
            u = Vector512.FusedMultiplyAdd(range, Vector512.Create(Unsafe.Add(ref c, 5)), u);
        }

        return (e, n, u);
    }

    /// <summary>Eight float values into a double buffer at [j ..] (the integrity comparisons run in double).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void StoreWide(Vector256<float> x, double[] destination, int j)
    {
        (Vector256<double> lower, Vector256<double> upper) = Vector256.Widen(x);
        ref double d = ref MemoryMarshal.GetArrayDataReference(destination);
        lower.StoreUnsafe(ref d, (nuint)j);
        upper.StoreUnsafe(ref d, (nuint)(j + 4));
    }

    /// <summary>Sixteen float values into a double buffer at [j ..].</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void StoreWide512(Vector512<float> x, double[] destination, int j)
    {
        (Vector512<double> lower, Vector512<double> upper) = Vector512.Widen(x);
        ref double d = ref MemoryMarshal.GetArrayDataReference(destination);
        lower.StoreUnsafe(ref d, (nuint)j);
        upper.StoreUnsafe(ref d, (nuint)(j + 8));
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

        DDSketch.AddKeysBatched(h, acc.Hpe, 1, s.Hpe, weight, s.HpeRun);
        DDSketch.AddKeysBatched(v, acc.Vpe, 1, s.Vpe, weight, s.VpeRun);
    }

    /// <summary>
    /// Sketch keys ceil(ln x / ln gamma) of eight values, the zero key at or below the resolution. The
    /// float logarithm is within a few ulps, so a value closer than ~1e-5 of a bucket width to a bucket
    /// edge may fall in the neighbour: its estimate stays within alpha (1 + 1e-5) of it.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector256<int> VectorKeys(Vector256<float> x, Vector256<float> inverseLnGamma, Vector256<float> minIndexable)
    {
        var positive = Vector256.GreaterThan(x, minIndexable);
        var safe = Vector256.ConditionalSelect(positive, x, Vector256<float>.One);
        var k = Vector256.ConvertToInt32(Vector256.Ceiling(FastMathSingle.Log(safe) * inverseLnGamma));
        return Vector256.ConditionalSelect(positive.AsInt32(), k, Vector256.Create(DDSketch.ZeroKey));
    }

    /// <summary><see cref="VectorKeys"/> on sixteen lanes.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector512<int> VectorKeys512(Vector512<float> x, Vector512<float> inverseLnGamma, Vector512<float> minIndexable)
    {
        var positive = Vector512.GreaterThan(x, minIndexable);
        var safe = Vector512.ConditionalSelect(positive, x, Vector512<float>.One);
        var k = Vector512.ConvertToInt32(Vector512.Ceiling(FastMathSingle.Log(safe) * inverseLnGamma));
        return Vector512.ConditionalSelect(positive.AsInt32(), k, Vector512.Create(DDSketch.ZeroKey));
    }

    /// <summary>The scalar twin of <see cref="VectorKeys"/> (identical keys).</summary>
    private static int ScalarKey(float x, float inverseLnGamma) =>
        x > Resolution ? (int)MathF.Ceiling(FastMathSingle.Log(x) * inverseLnGamma) : DDSketch.ZeroKey;

    /// <summary>The scalar twin of <see cref="SampleVector"/>: the same fused operations, one trial at a time.</summary>
    public static void SampleScalar(int m, int trials, float[] satErrors, CellAccumulator acc, long weight, TileScratch s)
    {
        int stride = s.LaneCapacity;
        ReadOnlySpan<float> coef = s.Coefficients.AsSpan(0, 8 * m);
        ReadOnlySpan<int> visible = s.Visible.AsSpan(0, m);
        ReadOnlySpan<float> l = s.CholeskySingle;
        ReadOnlySpan<float> z = s.Normals;
        float inverseLnGamma = (float)acc.Hpe.InverseLnGamma;
        float e0 = s.OffsetSingle[0], n0 = s.OffsetSingle[1], u0 = s.OffsetSingle[2];
        for (int j = 0; j < trials; j++)
        {
            float e = e0, n = n0, u = u0;
            for (int i = 0; i < m; i++)
            {
                int b = visible[i] * 4 * stride + j;
                float x0 = satErrors[b], x1 = satErrors[b + stride], x2 = satErrors[b + 2 * stride], x3 = satErrors[b + 3 * stride];
                int c = i * 8;
                float range = MathF.FusedMultiplyAdd(x2, coef[c + 2], MathF.FusedMultiplyAdd(x1, coef[c + 1], MathF.FusedMultiplyAdd(x0, coef[c], x3)));
                e = MathF.FusedMultiplyAdd(range, coef[c + 3], e);
                n = MathF.FusedMultiplyAdd(range, coef[c + 4], n);
                u = MathF.FusedMultiplyAdd(range, coef[c + 5], u);
            }

            float z0 = z[j], z1 = z[stride + j], z2 = z[2 * stride + j];
            e = MathF.FusedMultiplyAdd(l[0], z0, e);
            n = MathF.FusedMultiplyAdd(l[3], z0, MathF.FusedMultiplyAdd(l[4], z1, n));
            u = MathF.FusedMultiplyAdd(l[6], z0, MathF.FusedMultiplyAdd(l[7], z1, MathF.FusedMultiplyAdd(l[8], z2, u)));
            float hpe = MathF.Sqrt(MathF.FusedMultiplyAdd(e, e, n * n));
            float vpe = MathF.Abs(u);
            s.KeysH[j] = ScalarKey(hpe, inverseLnGamma);
            s.KeysV[j] = ScalarKey(vpe, inverseLnGamma);
            if (s.Integrity is { } values)
            {
                values.HpeValues[j] = hpe;
                values.VpeValues[j] = vpe;
            }
        }

        AddAll(acc, weight, s, trials);
    }
}

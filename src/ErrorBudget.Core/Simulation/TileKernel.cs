using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The per-tile work: for each user of a tile at one (epoch, trial block), the geometry once
/// (visible set, weighted least-squares projection S, DOPs, the Cholesky factor L of
/// S Sigma_user S^T), then every trial of the block through <see cref="TrialSampler"/>:
/// dx = S (u . dr_sat + clock_sat) + L z. The user-level errors are independent Gaussians per
/// satellite, so entering them through L is exact in distribution.
/// </summary>
internal sealed class TileKernel
{
    private readonly ServiceGrid _grid;
    private readonly CellAccumulator[] _cells;
    private readonly AreaWeights _weights;
    private readonly ElevationVariancePair _userVariances;
    private readonly double _assumedUreVariance;
    private readonly double _sinMask;
    private readonly double _prefilterSinMaskSquared;
    private readonly ulong _seed;
    private readonly int _satellites;
    private readonly bool _simd;
    private readonly Relativity.RelativisticUserBias _userBias;
    private readonly IntegrityKernel? _integrity;
    private readonly bool _araim;
    private readonly int _trials;

    public TileKernel(SimulationSetup setup, CellAccumulator[] cells, bool useSimd, IntegrityKernel? integrity = null)
    {
        _integrity = integrity;
        _araim = integrity?.Spec.Method == Scenarios.ProtectionLevelMethod.Araim;
        _trials = setup.Trials;
        _grid = setup.Grid;
        _cells = cells;
        _weights = setup.Weights;
        _userVariances = new ElevationVariancePair(
            new ElevationVarianceTable(UserErrorModel.From(setup.Scenario.User)),
            new ElevationVarianceTable(UserErrorModel.From(setup.Scenario.Assumed.User)));
        // The receiver's satellite-level sigma: the assumed URE, or sigma_URA for ARAIM (its weights are C_int^-1).
        double ure = integrity?.Spec.Method == Scenarios.ProtectionLevelMethod.Araim
            ? integrity.Spec.Araim.UraSigmaMeters
            : setup.Scenario.Assumed.UreSigmaMeters;
        _assumedUreVariance = ure * ure;
        _sinMask = Math.Sin(setup.Scenario.Grid.MaskDeg * Math.PI / 180.0);
        _prefilterSinMaskSquared = _sinMask * _sinMask * (1.0 - 1e-12);
        _seed = setup.Seed;
        _satellites = setup.Scenario.TotalSatellites;
        _simd = useSimd;
        _userBias = new Relativity.RelativisticUserBias(setup.Scenario.Relativity);
    }

    /// <summary>Processes one tile at one (epoch, trial block) into the cells' accumulators and the scratch's epoch share.</summary>
    public void Process(EpochWork work, Tile tile, TileScratch scratch)
    {
        scratch.ResetEpochShare();
        if (scratch.Batches > 1)
        {
            scratch.SetTrialBlock(work.FirstTrial, work.BlockTrials, _trials);
        }

        lock (tile.Gate)
        {
            for (int c = tile.First; c < tile.First + tile.Count; c++)
            {
                ProcessUser(work, _grid.Cells[c], _cells[c], _weights.Integer[c], scratch);
            }
        }
    }

    /// <summary>The three user-level normal streams of (epoch, user), one per ENU axis, indexed by trial.</summary>
    internal static void FillUserNormals(ulong seed, int epoch, int user, int firstTrial, int count, TileScratch s)
    {
        // Key(seed, UserLocal, epoch, user, axis) in steps: the shared prefix once, not three times.
        ulong userState = CounterRng.KeyWithB(CounterRng.KeyWithA(CounterRng.KeyStart(seed, RandomPurpose.UserLocal), epoch), user);
        for (int axis = 0; axis < 3; axis++)
        {
            ulong key = CounterRng.KeyWithC(userState, axis);
            SingleNormals.Fill(key, firstTrial, s.Normals.AsSpan(axis * s.LaneCapacity, count));
        }
    }

    /// <summary>
    /// The geometry of one (epoch, user) exactly as the kernel computes it (visible set, lines of sight,
    /// assumed weights, truth user-level variances, S and the covariance, in the scratch), for the exact
    /// path. False when the epoch has no solution; <paramref name="m"/> is the satellites in view.
    /// </summary>
    internal bool TrySolveGeometry(EpochWork work, GridCell cell, TileScratch s, out int m, out Dop dop)
    {
        m = SelectVisible(work, cell, s);
        dop = default;
        return m >= PositionSolution.MinSatellites && Solve(m, s, out dop);
    }

    private void ProcessUser(EpochWork work, GridCell cell, CellAccumulator acc, long weight, TileScratch s)
    {
        StageClock? clock = s.Stages;
        long t0 = clock is null ? 0 : StageClock.Now;
        int m = SelectVisible(work, cell, s);
        if (work.IsFirstBlock)
        {
            acc.Epochs++;
            acc.SatsInViewSum += m;
            s.WeightSum += weight;
            s.SatsInViewWeighted += weight * m;
        }

        if (m < 4 || !Solve(m, s, out Dop dop))
        {
            if (work.IsFirstBlock)
            {
                acc.UnavailableEpochs++;
                s.UnavailableWeight += weight;
            }

            if (clock is not null)
            {
                clock.Geometry += StageClock.Now - t0;
            }

            return;
        }

        double hpl = double.NaN, vpl = double.NaN;
        bool available = false;
        if (_integrity is not null)
        {
            (hpl, vpl, available) = _araim
                ? _integrity.AraimLevels(m, s, s.Integrity!)
                : _integrity.WeightedLevels(s);
            if (work.IsFirstBlock)
            {
                IntegrityKernel.CountEpoch(acc.Integrity!, hpl, vpl, available);
            }
        }

        if (work.IsFirstBlock)
        {
            // One vector logarithm for the three DOP keys (DOPs are >= 1, so no zero bucket; the
            // series log is within 1e-15 of Math.Log, as DDSketch.KeyOf uses).
            var keys = Vector256.ConvertToInt64(Vector256.Ceiling(
                FastMath256.LogOfPositive(Vector256.Create(dop.Pdop, dop.Hdop, dop.Vdop, 1.0)) * Vector256.Create(acc.Pdop.InverseLnGamma)));
            int pdopKey = (int)keys.GetElement(0);
            acc.Pdop.AddKey(pdopKey, 1);
            acc.Hdop.AddKey((int)keys.GetElement(1), 1);
            acc.Vdop.AddKey((int)keys.GetElement(2), 1);
            s.Pdop.AddKey(pdopKey, weight);
        }

        PositionSolution.ProjectCovariance(s.Projection.AsSpan(0, 4 * m), m, s.TruthVariance.AsSpan(0, m), s.Covariance3);
        PositionSolution.TryCholesky3(s.Covariance3, s.Cholesky3);
        BuildCoefficients(m, s);
        CommonOffset(m, work, cell, s);
        s.RoundForTrialLoop();

        int trials = work.BlockTrials;
        long geometryEnd = clock is null ? 0 : StageClock.Now;
        long normalsEnd = geometryEnd;
        long sketchesBefore = clock?.Sketches ?? 0;
        if (_araim)
        {
            AraimTrialSampler.Sample(m, work, cell.Index, _seed, acc, weight, s);
        }
        else
        {
            bool vector = _simd && TrialSampler.VectorPathAvailable;
            FillUserNormals(_seed, work.Epoch, cell.Index, work.FirstTrial, vector ? TrialSampler.VectorLanes(trials, s) : trials, s);
            normalsEnd = clock is null ? 0 : StageClock.Now;
            if (vector)
            {
                TrialSampler.SampleVector(m, trials, work.SatelliteErrorsSingle, acc, weight, s);
            }
            else
            {
                TrialSampler.SampleScalar(m, trials, work.SatelliteErrorsSingle, acc, weight, s);
            }
        }

        long samplingEnd = clock is null ? 0 : StageClock.Now;
        acc.Samples += trials;
        s.Samples += trials;
        if (_integrity is not null)
        {
            _integrity.Tally(acc.Integrity!, s.Integrity!, trials, hpl, vpl, available, _araim ? s.Integrity!.Flagged.AsSpan(0, trials) : []);
            _integrity.SampleOverbound(m, work, cell.Index, s, s.Integrity!, s.IntegrityVariance);
        }

        if (clock is not null)
        {
            clock.Geometry += geometryEnd - t0;
            clock.UserNormals += normalsEnd - geometryEnd;
            // The sketch inserts inside the sampler are timed apart (TrialSampler.AddAll).
            clock.Projection += samplingEnd - normalsEnd - (clock.Sketches - sketchesBefore);
            clock.Integrity += StageClock.Now - samplingEnd;
        }
    }

    /// <summary>
    /// The satellites above the mask, in index order, with their lines of sight. A vector prefilter
    /// over four satellites at a time rejects those clearly below the mask without a square root
    /// (up . d &gt;= 0 and (up . d)^2 &gt;= sin^2(mask) |d|^2, valid for masks in [0, 90) deg, loosened by
    /// 1e-12 so it never rejects a satellite the exact test keeps); the exact test then decides, so
    /// the visible set is the same as testing every satellite exactly. A block with candidates gets its
    /// unit vectors and ENU components in vector form (one square root and division for four).
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private int SelectVisible(EpochWork work, GridCell cell, TileScratch s)
    {
        EnuFrame frame = cell.Frame;
        Vec3 origin = frame.Origin;
        Vec3 up = frame.Up;
        var ox = Vector256.Create(origin.X);
        var oy = Vector256.Create(origin.Y);
        var oz = Vector256.Create(origin.Z);
        var ux = Vector256.Create(up.X);
        var uy = Vector256.Create(up.Y);
        var uz = Vector256.Create(up.Z);
        var ex = Vector256.Create(frame.East.X);
        var ey = Vector256.Create(frame.East.Y);
        var ez = Vector256.Create(frame.East.Z);
        var nx = Vector256.Create(frame.North.X);
        var ny = Vector256.Create(frame.North.Y);
        var nz = Vector256.Create(frame.North.Z);
        var threshold = Vector256.Create(_prefilterSinMaskSquared);
        int m = 0;
        for (int block = 0; block < work.PositionX.Length; block += 4)
        {
            var dx = Vector256.LoadUnsafe(ref MemoryMarshal.GetArrayDataReference(work.PositionX), (nuint)block) - ox;
            var dy = Vector256.LoadUnsafe(ref MemoryMarshal.GetArrayDataReference(work.PositionY), (nuint)block) - oy;
            var dz = Vector256.LoadUnsafe(ref MemoryMarshal.GetArrayDataReference(work.PositionZ), (nuint)block) - oz;
            var h = (dx * ux) + (dy * uy) + (dz * uz);
            var d2 = (dx * dx) + (dy * dy) + (dz * dz);
            var candidate = Vector256.GreaterThanOrEqual(h, Vector256<double>.Zero)
                & Vector256.GreaterThanOrEqual(h * h, threshold * d2);
            uint bits = candidate.ExtractMostSignificantBits();
            if (bits == 0)
            {
                continue;
            }

            // The candidates' unit vectors and ENU components, four at a time, in the operations and
            // order of Vec3.Norm, Vec3 / double and EnuFrame.ToEnu (so the bits are the scalar ones).
            var norm = Vector256.Sqrt(d2);
            var lx = dx / norm;
            var ly = dy / norm;
            var lz = dz / norm;
            ref double lanes = ref MemoryMarshal.GetArrayDataReference(s.BlockLanes);
            lx.StoreUnsafe(ref lanes, 0);
            ly.StoreUnsafe(ref lanes, 4);
            lz.StoreUnsafe(ref lanes, 8);
            ((ex * lx) + (ey * ly) + (ez * lz)).StoreUnsafe(ref lanes, 12);
            ((nx * lx) + (ny * ly) + (nz * lz)).StoreUnsafe(ref lanes, 16);
            ((ux * lx) + (uy * ly) + (uz * lz)).StoreUnsafe(ref lanes, 20);
            while (bits != 0)
            {
                int lane = BitOperations.TrailingZeroCount(bits);
                bits &= bits - 1;
                double sinElevation = s.BlockLanes[20 + lane];
                if (sinElevation < _sinMask)
                {
                    continue;
                }

                s.Visible[m] = block + lane;
                s.LineOfSight[m] = new Vec3(s.BlockLanes[lane], s.BlockLanes[4 + lane], s.BlockLanes[8 + lane]);
                s.LineOfSightEnu[m] = new Vec3(s.BlockLanes[12 + lane], s.BlockLanes[16 + lane], sinElevation);
                s.SinElevation[m] = sinElevation;
                m++;
            }
        }

        return m;
    }

    private bool Solve(int m, TileScratch s, out Dop dop)
    {
        for (int i = 0; i < m; i++)
        {
            _userVariances.At(s.SinElevation[i], out double truth, out double assumedUser);
            double assumed = _assumedUreVariance + assumedUser;
            s.IntegrityVariance[i] = assumed;
            s.Weights[i] = 1.0 / assumed;
            s.TruthVariance[i] = truth;
        }

        return PositionSolution.TrySolve(
            s.LineOfSightEnu.AsSpan(0, m), s.Weights.AsSpan(0, m), s.Projection.AsSpan(0, 4 * m), s.Covariance4, out dop);
    }

    /// <summary>
    /// S applied to the user-level deterministic range biases (missed Sagnac or Shapiro terms): the same
    /// position error in every trial of this (epoch, user), added once as the trials' starting value.
    /// </summary>
    private void CommonOffset(int m, EpochWork work, GridCell cell, TileScratch s)
    {
        double[] offset = s.CommonOffset;
        Array.Clear(offset);
        if (!_userBias.IsActive)
        {
            return;
        }

        Vec3 receiver = cell.Frame.Origin;
        for (int i = 0; i < m; i++)
        {
            double b = _userBias.RangeErrorMeters(work.States[s.Visible[i]].PositionEcef, receiver);
            for (int q = 0; q < 3; q++)
            {
                offset[q] += s.Projection[q * m + i] * b;
            }
        }
    }

    /// <summary>
    /// Per visible satellite i, 8 coefficients at [8 i ..]: the ECEF line of sight (u_x, u_y, u_z) that
    /// turns the orbit error into range (eps_i = u . dr + clock), then S_Ei, S_Ni, S_Ui that turn the
    /// range error into position (2 spare, for aligned loads), rounded to float for the trial loop.
    /// 7 multiply-adds per satellite and trial.
    /// </summary>
    internal static void BuildCoefficients(int m, TileScratch s)
    {
        double[] p = s.Projection;
        float[] coef = s.Coefficients;
        for (int i = 0; i < m; i++)
        {
            Vec3 u = s.LineOfSight[i];
            int o = i * 8;
            coef[o] = (float)u.X;
            coef[o + 1] = (float)u.Y;
            coef[o + 2] = (float)u.Z;
            coef[o + 3] = (float)p[i];
            coef[o + 4] = (float)p[m + i];
            coef[o + 5] = (float)p[2 * m + i];
        }
    }
}

using System.Runtime.CompilerServices;
using ErrorBudget.Core.Errors;
using ErrorBudget.Core.Geodesy;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Grid;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// The hot loop: for each user of a tile at one (epoch, trial block), the geometry once (visible
/// set, weighted least-squares projection S, DOPs), then every trial of the block:
/// dx = S (u . dr_sat + clock_sat) + L z, where the user-level errors (independent Gaussians per
/// satellite) enter exactly in distribution through the Cholesky factor L of S Sigma_user S^T.
/// </summary>
internal sealed class TileKernel
{
    private readonly ServiceGrid _grid;
    private readonly CellAccumulator[] _cells;
    private readonly AreaWeights _weights;
    private readonly UserErrorModel _truthUser;
    private readonly UserErrorModel _assumedUser;
    private readonly double _assumedUreVariance;
    private readonly double _sinMask;
    private readonly ulong _seed;
    private readonly int _satellites;

    public TileKernel(SimulationSetup setup, CellAccumulator[] cells)
    {
        _grid = setup.Grid;
        _cells = cells;
        _weights = setup.Weights;
        _truthUser = UserErrorModel.From(setup.Scenario.User);
        _assumedUser = UserErrorModel.From(setup.Scenario.Assumed.User);
        _assumedUreVariance = setup.Scenario.Assumed.UreSigmaMeters * setup.Scenario.Assumed.UreSigmaMeters;
        _sinMask = Math.Sin(setup.Scenario.Grid.MaskDeg * Math.PI / 180.0);
        _seed = setup.Seed;
        _satellites = setup.Scenario.TotalSatellites;
    }

    /// <summary>Processes one tile job into the cells' accumulators and the scratch's epoch share.</summary>
    public void Process(TileJob job, TileScratch scratch)
    {
        EpochWork work = job.Work;
        scratch.ResetEpochShare();
        lock (job.Tile.Gate)
        {
            for (int c = job.Tile.First; c < job.Tile.First + job.Tile.Count; c++)
            {
                ProcessUser(work, _grid.Cells[c], _cells[c], _weights.Integer[c], scratch);
            }
        }
    }

    private void ProcessUser(EpochWork work, GridCell cell, CellAccumulator acc, long weight, TileScratch s)
    {
        int m = SelectVisible(work.States, cell.Frame, s);
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

            return;
        }

        if (work.IsFirstBlock)
        {
            acc.Pdop.Add(dop.Pdop);
            acc.Hdop.Add(dop.Hdop);
            acc.Vdop.Add(dop.Vdop);
            s.Pdop.Add(dop.Pdop, weight);
        }

        PositionSolution.ProjectCovariance(s.Projection.AsSpan(0, 4 * m), m, s.TruthVariance.AsSpan(0, m), s.Covariance3);
        PositionSolution.TryCholesky3(s.Covariance3, s.Cholesky3);
        BuildCoefficients(m, s);

        int trials = work.BlockTrials;
        ulong userKey = CounterRng.Key(_seed, RandomPurpose.UserLocal, work.Epoch, cell.Index, 0);
        Span<double> z = s.Normals.AsSpan(0, 3 * trials);
        CounterRng.FillNormals(userKey, (ulong)work.FirstTrial * 3, z);
        SampleTrials(m, trials, work.SatelliteErrors, z, acc, weight, s);
        acc.Samples += trials;
        s.Samples += trials;
    }

    private int SelectVisible(ReadOnlySpan<Orbits.SatelliteState> states, in EnuFrame frame, TileScratch s)
    {
        Vec3 origin = frame.Origin;
        int m = 0;
        for (int sat = 0; sat < _satellites; sat++)
        {
            Vec3 d = states[sat].PositionEcef - origin;
            Vec3 u = d / d.Norm;
            Vec3 enu = frame.ToEnu(u);
            if (enu.Z < _sinMask)
            {
                continue;
            }

            s.Visible[m] = sat;
            s.LineOfSight[m] = u;
            s.LineOfSightEnu[m] = enu;
            s.ElevationRad[m] = Math.Asin(Math.Clamp(enu.Z, -1.0, 1.0));
            m++;
        }

        return m;
    }

    private bool Solve(int m, TileScratch s, out Dop dop)
    {
        for (int i = 0; i < m; i++)
        {
            double el = s.ElevationRad[i];
            s.Weights[i] = 1.0 / (_assumedUreVariance + _assumedUser.RangeVariance(el));
            s.TruthVariance[i] = _truthUser.RangeVariance(el);
        }

        return PositionSolution.TrySolve(
            s.LineOfSightEnu.AsSpan(0, m), s.Weights.AsSpan(0, m), s.Projection.AsSpan(0, 4 * m), s.Covariance4, out dop);
    }

    internal static void BuildCoefficients(int m, TileScratch s)
    {
        double[] p = s.Projection;
        double[] coef = s.Coefficients;
        for (int i = 0; i < m; i++)
        {
            Vec3 u = s.LineOfSight[i];
            for (int q = 0; q < 3; q++)
            {
                double sq = p[q * m + i];
                int o = (i * 3 + q) * 4;
                coef[o] = sq * u.X;
                coef[o + 1] = sq * u.Y;
                coef[o + 2] = sq * u.Z;
                coef[o + 3] = sq;
            }
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void SampleTrials(
        int m, int trials, double[] satErrors, ReadOnlySpan<double> z, CellAccumulator acc, long weight, TileScratch s)
    {
        ReadOnlySpan<double> coef = s.Coefficients.AsSpan(0, 12 * m);
        ReadOnlySpan<int> visible = s.Visible.AsSpan(0, m);
        ReadOnlySpan<double> l = s.Cholesky3;
        DDSketch cellH = acc.Hpe, cellV = acc.Vpe, epochH = s.Hpe, epochV = s.Vpe;
        int stride = trials * SatelliteErrorSampler.Components;
        for (int j = 0; j < trials; j++)
        {
            double e = 0, n = 0, u = 0;
            int baseOffset = j * SatelliteErrorSampler.Components;
            for (int i = 0; i < m; i++)
            {
                int o = visible[i] * stride + baseOffset;
                double x0 = satErrors[o], x1 = satErrors[o + 1], x2 = satErrors[o + 2], x3 = satErrors[o + 3];
                int c = i * 12;
                e += coef[c] * x0 + coef[c + 1] * x1 + coef[c + 2] * x2 + coef[c + 3] * x3;
                n += coef[c + 4] * x0 + coef[c + 5] * x1 + coef[c + 6] * x2 + coef[c + 7] * x3;
                u += coef[c + 8] * x0 + coef[c + 9] * x1 + coef[c + 10] * x2 + coef[c + 11] * x3;
            }

            double z0 = z[3 * j], z1 = z[3 * j + 1], z2 = z[3 * j + 2];
            e += l[0] * z0;
            n += l[3] * z0 + l[4] * z1;
            u += l[6] * z0 + l[7] * z1 + l[8] * z2;

            int kh = cellH.KeyOf(Math.Sqrt(e * e + n * n));
            int kv = cellH.KeyOf(Math.Abs(u));
            cellH.AddKey(kh, 1);
            cellV.AddKey(kv, 1);
            epochH.AddKey(kh, weight);
            epochV.AddKey(kv, weight);
        }
    }
}

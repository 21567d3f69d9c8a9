using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Core.Integrity.Araim;

internal sealed partial class AraimSolver
{
    /// <summary>
    /// Evaluates one geometry: all-in-view and subset solutions, thresholds, VPL, HPL, σ_acc and EMT.
    /// Keeps the projections and thresholds for <see cref="Test"/> and the accessors. Does not allocate.
    /// </summary>
    /// <param name="lineOfSightEnu">Unit vectors from the user to each satellite, ENU; m = length. Range: m ≤ MaxSatellites.</param>
    /// <param name="constellation">Caller's constellation id per satellite (any ints; equal ids = one constellation).</param>
    /// <param name="integrityVariance">σ²_int,i = σ²_URA,i + σ²_tropo,i + σ²_user,i, m². Range: &gt; 0 and finite.</param>
    /// <param name="accuracyVariance">σ²_acc,i = σ²_URE,i + σ²_tropo,i + σ²_user,i, m². Range: ≥ 0 and finite.</param>
    /// <param name="nominalBiasMeters">b_nom,i for integrity, metres. Range: ≥ 0 and finite.</param>
    /// <param name="result">The protection levels and availability figures; default when false is returned.</param>
    /// <returns>False when m &lt; 4, a variance or bias is out of range, or the all-in-view solution fails
    /// <see cref="PositionSolution.TrySolve"/>; <see cref="Test"/> is then unavailable.</returns>
    /// <exception cref="ArgumentException">The spans differ in length or m exceeds MaxSatellites.</exception>
    public bool TryEvaluate(
        ReadOnlySpan<Vec3> lineOfSightEnu,
        ReadOnlySpan<int> constellation,
        ReadOnlySpan<double> integrityVariance,
        ReadOnlySpan<double> accuracyVariance,
        ReadOnlySpan<double> nominalBiasMeters,
        out AraimResult result)
    {
        int m = lineOfSightEnu.Length;
        if (constellation.Length != m || integrityVariance.Length != m || accuracyVariance.Length != m || nominalBiasMeters.Length != m)
        {
            throw new ArgumentException("Every per-satellite span must have one entry per line of sight.", nameof(lineOfSightEnu));
        }

        ArgumentOutOfRangeException.ThrowIfGreaterThan(m, _maxSatellites, nameof(lineOfSightEnu));
        _evaluated = false;
        result = default;
        if (m < PositionSolution.MinSatellites || !TryCopyInputs(lineOfSightEnu, integrityVariance, accuracyVariance, nominalBiasMeters))
        {
            return false;
        }

        _m = m;
        MapConstellations(constellation);
        ReadOnlySpan<Vec3> los = _lineOfSight.AsSpan(0, m);
        if (!PositionSolution.TrySolve(los, _weights.AsSpan(0, m), _allInView.AsSpan(0, Rows * m), _covariance, out _))
        {
            return false;
        }

        for (int q = 0; q < Axes; q++)
        {
            ReadOnlySpan<double> row = _allInView.AsSpan(q * m, m);
            _faultFreeSigma[q] = Math.Sqrt(WeightedSquares(row, _integrityVariance));
            _faultFreeBias[q] = AbsoluteSum(row, _bias);
        }

        double sigmaAccuracy = Math.Sqrt(WeightedSquares(_allInView.AsSpan(PositionSolution.Up * m, m), _accuracyVariance));

        AraimParameters p = _parameters;
        var multiple = new MultipleFaultProbability();
        double unmonitored = 0.0;
        int unmonitorable = 0;
        _modeCount = 0;
        if (p.PSat > 0.0)
        {
            for (int i = 0; i < m; i++)
            {
                multiple.Add(p.PSat);
                if (!TryAddMode(FaultModeKind.Satellite, i, -1, p.PSat))
                {
                    unmonitored += p.PSat;
                    unmonitorable++;
                }
            }
        }

        if (p.PConst > 0.0)
        {
            for (int c = 0; c < _constellationCount; c++)
            {
                multiple.Add(p.PConst);
                if (!TryAddMode(FaultModeKind.Constellation, -1, c, p.PConst))
                {
                    unmonitored += p.PConst;
                    unmonitorable++;
                }
            }
        }

        unmonitored += multiple.TwoOrMore;
        double emt = ComputeThresholds();

        // The unmonitored share is taken from the integrity budget before it is split (ADD v3.0, from memory).
        double share = 1.0 - (unmonitored / (p.PhmiVertical + p.PhmiHorizontal));
        double vpl = SolveAxis(PositionSolution.Up, p.PhmiVertical * share);
        double hplEast = SolveAxis(PositionSolution.East, 0.5 * p.PhmiHorizontal * share);
        double hplNorth = SolveAxis(PositionSolution.North, 0.5 * p.PhmiHorizontal * share);

        result = new AraimResult(
            HplMeters: Math.Sqrt((hplEast * hplEast) + (hplNorth * hplNorth)),
            VplMeters: vpl,
            SigmaAccuracyVerticalMeters: sigmaAccuracy,
            EffectiveMonitorThresholdMeters: emt,
            FaultModes: _modeCount,
            UnmonitorableModes: unmonitorable,
            UnmonitoredPrior: unmonitored,
            UnmonitoredWithinThreshold: unmonitored <= p.PThres);
        _evaluated = true;
        return true;
    }

    private bool TryCopyInputs(
        ReadOnlySpan<Vec3> lineOfSightEnu, ReadOnlySpan<double> integrityVariance, ReadOnlySpan<double> accuracyVariance, ReadOnlySpan<double> bias)
    {
        for (int i = 0; i < lineOfSightEnu.Length; i++)
        {
            double vi = integrityVariance[i], va = accuracyVariance[i], b = bias[i];
            if (!(vi > 0.0) || !double.IsFinite(vi) || !(va >= 0.0) || !double.IsFinite(va) || !(b >= 0.0) || !double.IsFinite(b))
            {
                return false;
            }

            _lineOfSight[i] = lineOfSightEnu[i];
            _integrityVariance[i] = vi;
            _weights[i] = 1.0 / vi;
            _accuracyVariance[i] = va;
            _bias[i] = b;
        }

        return true;
    }

    /// <summary>Numbers the distinct constellation ids 0 … C − 1 in order of first appearance (O(m·C), no allocation).</summary>
    private void MapConstellations(ReadOnlySpan<int> constellation)
    {
        _constellationCount = 0;
        for (int i = 0; i < constellation.Length; i++)
        {
            int index = _constellationIds.AsSpan(0, _constellationCount).IndexOf(constellation[i]);
            if (index < 0)
            {
                index = _constellationCount++;
                _constellationIds[index] = constellation[i];
            }

            _constellationOf[i] = index;
        }
    }

    /// <summary>Solves the subset of one fault mode and stores it as mode number ModeCount; false if unmonitorable.</summary>
    private bool TryAddMode(FaultModeKind kind, int satellite, int constellationIndex, double prior)
    {
        int m = _m, k = _modeCount, used = 0;
        for (int i = 0; i < m; i++)
        {
            bool removed = kind == FaultModeKind.Satellite ? i == satellite : _constellationOf[i] == constellationIndex;
            _subsetWeights[i] = removed ? 0.0 : _weights[i];
            used += removed ? 0 : 1;
        }

        Span<double> projection = _projections.AsSpan(k * _stride, Rows * m);
        if (used < PositionSolution.MinSatellites
            || !PositionSolution.TrySolve(_lineOfSight.AsSpan(0, m), _subsetWeights.AsSpan(0, m), projection, _covariance, out _))
        {
            return false;
        }

        for (int q = 0; q < Axes; q++)
        {
            ReadOnlySpan<double> row = projection.Slice(q * m, m);
            ReadOnlySpan<double> row0 = _allInView.AsSpan(q * m, m);
            double separationSquares = 0.0, separationAbs = 0.0;
            for (int i = 0; i < m; i++)
            {
                double d = row[i] - row0[i];
                separationSquares += d * d * _accuracyVariance[i];
                separationAbs += Math.Abs(d);
            }

            int at = (k * Axes) + q;
            _modeSigma[at] = Math.Sqrt(WeightedSquares(row, _integrityVariance));
            _modeBias[at] = AbsoluteSum(row, _bias);
            _separationSigma[at] = Math.Sqrt(separationSquares);
            _separationBias[at] = separationAbs * _parameters.NominalBiasAccuracyMeters;
        }

        int id = _constellationIds[kind == FaultModeKind.Satellite ? _constellationOf[satellite] : constellationIndex];
        _modes[k] = new FaultModeInfo(kind, satellite, id, prior, used);
        _modeConstellation[k] = kind == FaultModeKind.Satellite ? -1 : constellationIndex;
        _modeCount = k + 1;
        return true;
    }

    /// <summary>T_k,q for every monitored mode (P_FA split evenly over the N modes); returns the EMT.</summary>
    private double ComputeThresholds()
    {
        int n = _modeCount;
        if (n == 0)
        {
            return 0.0;
        }

        AraimParameters p = _parameters;
        double kVertical = GaussianTail.InverseQ(p.PFalseAlarmVertical / (2.0 * n));
        double kHorizontal = GaussianTail.InverseQ(p.PFalseAlarmHorizontal / (4.0 * n));
        double emt = 0.0;
        for (int k = 0; k < n; k++)
        {
            for (int q = 0; q < Axes; q++)
            {
                int at = (k * Axes) + q;
                double kfa = q == PositionSolution.Up ? kVertical : kHorizontal;
                _threshold[at] = (kfa * _separationSigma[at]) + _separationBias[at];
            }

            if (_modes[k].Prior >= p.PEmt)
            {
                emt = Math.Max(emt, _threshold[(k * Axes) + PositionSolution.Up]);
            }
        }

        return emt;
    }

    /// <summary>The protection level of one axis: fault-free term (prior 2) plus one term per monitored mode.</summary>
    private double SolveAxis(int q, double target)
    {
        int n = _modeCount;
        _termPrior[0] = 2.0;
        _termSigma[0] = _faultFreeSigma[q];
        _termOffset[0] = _faultFreeBias[q];
        for (int k = 0; k < n; k++)
        {
            int at = (k * Axes) + q;
            _termPrior[k + 1] = _modes[k].Prior;
            _termSigma[k + 1] = _modeSigma[at];
            _termOffset[k + 1] = _threshold[at] + _modeBias[at];
        }

        return ProtectionLevelSearch.Solve(
            _termPrior.AsSpan(0, n + 1), _termSigma.AsSpan(0, n + 1), _termOffset.AsSpan(0, n + 1), target, _parameters.TolPlMeters);
    }

    private static double WeightedSquares(ReadOnlySpan<double> row, ReadOnlySpan<double> variance)
    {
        double s = 0.0;
        for (int i = 0; i < row.Length; i++)
        {
            s += row[i] * row[i] * variance[i];
        }

        return s;
    }

    private static double AbsoluteSum(ReadOnlySpan<double> row, ReadOnlySpan<double> bias)
    {
        double s = 0.0;
        for (int i = 0; i < row.Length; i++)
        {
            s += Math.Abs(row[i]) * bias[i];
        }

        return s;
    }
}

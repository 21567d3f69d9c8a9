using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;
using MathNet.Numerics.Distributions;

namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>
/// The baseline ARAIM multiple-hypothesis solution-separation (MHSS) user algorithm for one user at one
/// epoch: all-in-view and fault-tolerant subset solutions, solution-separation thresholds, VPL, HPL,
/// σ_acc and EMT (<see cref="TryEvaluate"/>), then fault detection and a simple exclusion on samples of
/// range errors (<see cref="Test"/>). All buffers are sized at construction; neither call allocates.
/// </summary>
/// <remarks>
/// <para>Formulas: WG-C ARAIM TSG Reference Airborne Algorithm Description Document (ADD) v3.0 and
/// Blanch et al., ION GNSS 2012, as summarised in REFERENCE-VALUES §5 (from memory). Geometry and
/// sign convention: <see cref="PositionSolution"/>, S = (GᵀWG)⁻¹GᵀW with W = C_int⁻¹; a subset solution
/// gives weight 0 to the satellites its fault mode removes.</para>
/// <para>Per mode k and axis q (E, N, U): σ_q⁽ᵏ⁾² = Σᵢ S_q,i⁽ᵏ⁾² σ²_int,i; b_q⁽ᵏ⁾ = Σᵢ |S_q,i⁽ᵏ⁾| b_nom,i;
/// σ_ss,q⁽ᵏ⁾² = Σᵢ (S_q,i⁽ᵏ⁾ − S_q,i⁽⁰⁾)² σ²_acc,i; T_k,q = K_fa,q σ_ss,q⁽ᵏ⁾ + Σᵢ |S_q,i⁽ᵏ⁾ − S_q,i⁽⁰⁾| b_nom,acc with
/// K_fa,U = Q⁻¹(P_FA_VERT/(2N)), K_fa,E/N = Q⁻¹(P_FA_HOR/(4N)), N monitored modes. VPL solves
/// 2Q((VPL − b_U⁽⁰⁾)/σ_U⁽⁰⁾) + Σₖ p_k Q((VPL − T_k,U − b_U⁽ᵏ⁾)/σ_U⁽ᵏ⁾) = PHMI_VERT (1 − P_nm/(PHMI_VERT + PHMI_HOR));
/// HPL_E and HPL_N the same with PHMI_HOR/2 each; HPL = √(HPL_E² + HPL_N²) (<see cref="ProtectionLevelSearch"/>).</para>
/// <para>Simplifications of the baseline, stated once:
/// (1) one receiver clock for all constellations (the ADD estimates one clock per constellation), so an
/// inter-constellation time offset must already be removed from the ranges;
/// (2) monitored modes are the single-satellite modes (prior P_sat) and the constellation-wide modes
/// (prior P_const, one per distinct constellation id) only; the prior that two or more independent
/// events occur together is counted as unmonitored instead of monitoring multi-fault subsets, and the
/// epoch is flagged unavailable when P_nm &gt; P_THRES; modes with prior 0 are not monitored at all;
/// (3) a mode whose subset keeps fewer than 4 satellites, or whose subset solution fails
/// <see cref="PositionSolution.TrySolve"/> (a Cholesky pivot ≤ 1e-12 × trace), is unmonitorable and its
/// prior joins P_nm; an ill-conditioned but solvable subset just gives large σ and large PLs;
/// (4) a constellation with one satellite gives a constellation mode with the same subset as that
/// satellite's mode: both are kept (the PL terms add up to the merged prior; N counts both);
/// (5) no exposure-time multipliers, fault consolidation or re-allocation of the integrity budget;
/// (6) exclusion is simplified, see <see cref="Test"/>.</para>
/// <para>Not thread-safe: one solver per worker (it keeps the last evaluation for <see cref="Test"/>).</para>
/// </remarks>
internal sealed partial class AraimSolver
{
    /// <summary>Largest supported maxSatellites (memory grows as 8·max² doubles).</summary>
    internal const int MaxSatellitesLimit = 256;

    private const int Axes = 3;
    private const int Rows = 4;

    private readonly AraimParameters _parameters;
    private readonly int _maxSatellites;
    private readonly int _stride;

    private readonly Vec3[] _lineOfSight;
    private readonly double[] _weights;
    private readonly double[] _subsetWeights;
    private readonly double[] _integrityVariance;
    private readonly double[] _accuracyVariance;
    private readonly double[] _bias;
    private readonly int[] _constellationOf;
    private readonly int[] _constellationIds;
    private readonly double[] _allInView;
    private readonly double[] _projections;
    private readonly FaultModeInfo[] _modes;
    private readonly int[] _modeConstellation;
    private readonly double[] _modeSigma;
    private readonly double[] _modeBias;
    private readonly double[] _separationSigma;
    private readonly double[] _separationBias;
    private readonly double[] _threshold;
    private readonly double[] _faultFreeSigma = new double[Axes];
    private readonly double[] _faultFreeBias = new double[Axes];
    private readonly double[] _covariance = new double[16];
    private readonly double[] _termPrior;
    private readonly double[] _termSigma;
    private readonly double[] _termOffset;
    private readonly double[] _chiSquareThreshold;
    private readonly double[] _estimates;
    private readonly double[] _normalizedSeparation;

    private int _m;
    private int _constellationCount;
    private int _modeCount;
    private bool _evaluated;

    /// <summary>Preallocates every buffer for up to <paramref name="maxSatellites"/> satellites.</summary>
    /// <param name="maxSatellites">Largest m that <see cref="TryEvaluate"/> accepts. Range: 4 ≤ max ≤ 256.</param>
    /// <param name="parameters">Allocations and ISM values; validated here.</param>
    /// <exception cref="ArgumentOutOfRangeException">maxSatellites or a parameter is out of range.</exception>
    public AraimSolver(int maxSatellites, AraimParameters parameters)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        ArgumentOutOfRangeException.ThrowIfLessThan(maxSatellites, PositionSolution.MinSatellites);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(maxSatellites, MaxSatellitesLimit);
        parameters.ThrowIfInvalid();

        _parameters = parameters;
        _maxSatellites = maxSatellites;
        _stride = Rows * maxSatellites;
        int maxModes = 2 * maxSatellites; // every satellite plus at most one constellation per satellite

        _lineOfSight = new Vec3[maxSatellites];
        _weights = new double[maxSatellites];
        _subsetWeights = new double[maxSatellites];
        _integrityVariance = new double[maxSatellites];
        _accuracyVariance = new double[maxSatellites];
        _bias = new double[maxSatellites];
        _constellationOf = new int[maxSatellites];
        _constellationIds = new int[maxSatellites];
        _allInView = new double[_stride];
        _projections = new double[maxModes * _stride];
        _modes = new FaultModeInfo[maxModes];
        _modeConstellation = new int[maxModes];
        _modeSigma = new double[maxModes * Axes];
        _modeBias = new double[maxModes * Axes];
        _separationSigma = new double[maxModes * Axes];
        _separationBias = new double[maxModes * Axes];
        _threshold = new double[maxModes * Axes];
        _termPrior = new double[maxModes + 1];
        _termSigma = new double[maxModes + 1];
        _termOffset = new double[maxModes + 1];
        _estimates = new double[maxModes * Rows];
        _normalizedSeparation = new double[maxModes];

        // χ²(dof) quantiles at 1 − P_exclusion for the residual test, dof = satellites used − 4.
        _chiSquareThreshold = new double[maxSatellites - PositionSolution.MinSatellites + 1];
        _chiSquareThreshold[0] = double.NaN; // no redundancy: the test cannot pass
        for (int dof = 1; dof < _chiSquareThreshold.Length; dof++)
        {
            _chiSquareThreshold[dof] = ChiSquared.InvCDF(dof, 1.0 - parameters.PExclusionTest);
        }
    }

    /// <summary>The parameters in use.</summary>
    public AraimParameters Parameters => _parameters;

    /// <summary>Largest number of satellites accepted.</summary>
    public int MaxSatellites => _maxSatellites;

    /// <summary>Satellites m of the last successful <see cref="TryEvaluate"/> (0 before).</summary>
    public int SatelliteCount => _evaluated ? _m : 0;

    /// <summary>Monitored fault modes of the last successful evaluation; mode indices run 0 … ModeCount − 1.</summary>
    public int ModeCount => _evaluated ? _modeCount : 0;

    /// <summary>Subset, prior and size of monitored fault mode <paramref name="k"/>.</summary>
    public FaultModeInfo Mode(int k) => _modes[CheckMode(k)];

    /// <summary>True when fault mode <paramref name="k"/> removes satellite <paramref name="satellite"/> (0 … m − 1).</summary>
    public bool Removes(int k, int satellite)
    {
        CheckMode(k);
        ArgumentOutOfRangeException.ThrowIfNegative(satellite);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(satellite, _m);
        return RemovesUnchecked(k, satellite);
    }

    /// <summary>The all-in-view projection S⁽⁰⁾, 4 × m row-major (rows E, N, U, clock), of the last evaluation.</summary>
    public ReadOnlySpan<double> AllInViewProjection => _allInView.AsSpan(0, Rows * SatelliteCount);

    /// <summary>The subset projection S⁽ᵏ⁾ of mode <paramref name="k"/>, 4 × m row-major, zero columns for removed satellites.</summary>
    public ReadOnlySpan<double> ModeProjection(int k) => _projections.AsSpan(CheckMode(k) * _stride, Rows * _m);

    /// <summary>σ_q⁽⁰⁾ of the all-in-view solution under C_int, metres; axis 0 E, 1 N, 2 U.</summary>
    public double FaultFreeSigmaMeters(int axis) => _faultFreeSigma[CheckEvaluatedAxis(axis)];

    /// <summary>b_q⁽⁰⁾ = Σᵢ |S_q,i⁽⁰⁾| b_nom,i, metres.</summary>
    public double FaultFreeBiasMeters(int axis) => _faultFreeBias[CheckEvaluatedAxis(axis)];

    /// <summary>σ_q⁽ᵏ⁾ of subset k under C_int, metres.</summary>
    public double ModeSigmaMeters(int k, int axis) => _modeSigma[(CheckMode(k) * Axes) + CheckAxis(axis)];

    /// <summary>b_q⁽ᵏ⁾ = Σᵢ |S_q,i⁽ᵏ⁾| b_nom,i, metres.</summary>
    public double ModeBiasMeters(int k, int axis) => _modeBias[(CheckMode(k) * Axes) + CheckAxis(axis)];

    /// <summary>σ_ss,q⁽ᵏ⁾ of the separation x̂⁽ᵏ⁾ − x̂⁽⁰⁾ under C_acc, metres.</summary>
    public double SeparationSigmaMeters(int k, int axis) => _separationSigma[(CheckMode(k) * Axes) + CheckAxis(axis)];

    /// <summary>T_k,q, the solution-separation threshold, metres.</summary>
    public double ThresholdMeters(int k, int axis) => _threshold[(CheckMode(k) * Axes) + CheckAxis(axis)];

    private int CheckMode(int k)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(k);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(k, ModeCount);
        return k;
    }

    private int CheckEvaluatedAxis(int axis)
    {
        if (!_evaluated)
        {
            throw new InvalidOperationException("No successful TryEvaluate yet.");
        }

        return CheckAxis(axis);
    }

    private static int CheckAxis(int axis)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(axis);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(axis, Axes);
        return axis;
    }

    private bool RemovesUnchecked(int k, int satellite) =>
        _modes[k].Kind == FaultModeKind.Satellite
            ? _modes[k].Satellite == satellite
            : _constellationOf[satellite] == _modeConstellation[k];
}

namespace ErrorBudget.Core.Integrity.Araim;

/// <summary>
/// Allocations and integrity-support-message (ISM) values of the baseline ARAIM MHSS user algorithm.
/// Defaults are the baseline values of the WG-C ARAIM Technical Subgroup "Reference Airborne Algorithm
/// Description Document" (ADD) v3.0, 15 Nov 2017, for LPV-200 — all from memory (REFERENCE-VALUES §5).
/// </summary>
/// <remarks>
/// The ISM gives σ_URA, σ_URE, b_nom and P_sat per satellite and P_const per constellation; this baseline
/// uses one P_sat and one P_const for all (the caller's variances and biases stay per satellite).
/// Probabilities are per approach.
/// </remarks>
internal sealed record AraimParameters
{
    /// <summary>PHMI_VERT, vertical integrity budget (ADD v3.0, from memory: 9.8e-8). Range: 0 &lt; p &lt; 1.</summary>
    public double PhmiVertical { get; init; } = 9.8e-8;

    /// <summary>PHMI_HOR, horizontal integrity budget (ADD v3.0, from memory: 2e-9). Range: 0 &lt; p &lt; 1.</summary>
    public double PhmiHorizontal { get; init; } = 2e-9;

    /// <summary>P_THRES, largest acceptable prior of unmonitored fault modes (ADD v3.0, from memory: 8e-8). Range: 0 ≤ p ≤ 1.</summary>
    public double PThres { get; init; } = 8e-8;

    /// <summary>P_FA_VERT, vertical false-alert budget (ADD v3.0, from memory: 3.9e-6). Range: 0 &lt; p &lt; 1.</summary>
    public double PFalseAlarmVertical { get; init; } = 3.9e-6;

    /// <summary>P_FA_HOR, horizontal false-alert budget (ADD v3.0, from memory: 9e-8). Range: 0 &lt; p &lt; 1.</summary>
    public double PFalseAlarmHorizontal { get; init; } = 9e-8;

    /// <summary>TOL_PL, stopping width of the protection-level search, metres (ADD v3.0, from memory: 5e-2 m). Range: &gt; 0.</summary>
    public double TolPlMeters { get; init; } = 5e-2;

    /// <summary>K_ACC, 95 % accuracy factor, for callers comparing K_ACC·σ_acc with the accuracy requirement
    /// (ADD v3.0, from memory: 1.96; not used by the solver). Range: &gt; 0.</summary>
    public double KAcc { get; init; } = 1.96;

    /// <summary>P_EMT, smallest mode prior that counts for the effective monitor threshold (ADD v3.0, from memory: 1e-5). Range: 0 ≤ p ≤ 1.</summary>
    public double PEmt { get; init; } = 1e-5;

    /// <summary>P_sat, prior of a fault of one satellite (ATSG simulation value, from memory: 1e-5). Range: 0 ≤ p &lt; 1.</summary>
    public double PSat { get; init; } = 1e-5;

    /// <summary>P_const, prior of a constellation-wide fault (ATSG simulation value for Galileo, from memory: 1e-4;
    /// 1e-8 for GPS). Range: 0 ≤ p &lt; 1.</summary>
    public double PConst { get; init; } = 1e-4;

    /// <summary>b_nom for integrity, metres (ATSG simulation value, from memory: 0.75 m). Range: ≥ 0.</summary>
    public double NominalBiasIntegrityMeters { get; init; } = 0.75;

    /// <summary>b_nom for accuracy and continuity, metres, applied to every satellite in the test thresholds
    /// (ATSG simulation value, from memory: 0). Range: ≥ 0.</summary>
    public double NominalBiasAccuracyMeters { get; init; }

    /// <summary>σ_URE/σ_URA (ATSG simulation value, from memory: 2/3). Range: ≥ 0.</summary>
    public double UreOverUra { get; init; } = 2.0 / 3.0;

    /// <summary>False-alarm probability of the residual χ² test that accepts an exclusion candidate.
    /// A choice of this simplified exclusion, not an ADD value: default the total P_FA = 4e-6 per approach
    /// (ADD v3.0, from memory). Range: 0 &lt; p &lt; 1.</summary>
    public double PExclusionTest { get; init; } = 4e-6;

    /// <summary>Integrity variance σ²_int,i = σ_URA,i² + local (troposphere + user) variance, m².</summary>
    public double IntegrityVariance(double sigmaUraMeters, double localVarianceMeters2) =>
        (sigmaUraMeters * sigmaUraMeters) + localVarianceMeters2;

    /// <summary>Accuracy variance σ²_acc,i = (σ_URE/σ_URA · σ_URA,i)² + local variance, m².</summary>
    public double AccuracyVariance(double sigmaUraMeters, double localVarianceMeters2)
    {
        double ure = UreOverUra * sigmaUraMeters;
        return (ure * ure) + localVarianceMeters2;
    }

    /// <summary>Every out-of-range value at once (empty when all are valid).</summary>
    public IReadOnlyList<AraimParameterError> Validate()
    {
        var errors = new List<AraimParameterError>();
        Open(errors, nameof(PhmiVertical), PhmiVertical);
        Open(errors, nameof(PhmiHorizontal), PhmiHorizontal);
        Closed(errors, nameof(PThres), PThres);
        Open(errors, nameof(PFalseAlarmVertical), PFalseAlarmVertical);
        Open(errors, nameof(PFalseAlarmHorizontal), PFalseAlarmHorizontal);
        Positive(errors, nameof(TolPlMeters), TolPlMeters);
        Positive(errors, nameof(KAcc), KAcc);
        Closed(errors, nameof(PEmt), PEmt);
        HalfOpen(errors, nameof(PSat), PSat);
        HalfOpen(errors, nameof(PConst), PConst);
        NonNegative(errors, nameof(NominalBiasIntegrityMeters), NominalBiasIntegrityMeters);
        NonNegative(errors, nameof(NominalBiasAccuracyMeters), NominalBiasAccuracyMeters);
        NonNegative(errors, nameof(UreOverUra), UreOverUra);
        Open(errors, nameof(PExclusionTest), PExclusionTest);
        return errors;
    }

    /// <summary>Throws for the first out-of-range value.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Names the parameter, its value and the allowed range.</exception>
    public void ThrowIfInvalid()
    {
        IReadOnlyList<AraimParameterError> errors = Validate();
        if (errors.Count > 0)
        {
            throw new ArgumentOutOfRangeException(errors[0].Name, errors[0].Value, errors[0].Message);
        }
    }

    private static void Open(List<AraimParameterError> errors, string name, double v)
    {
        if (!(v > 0.0 && v < 1.0))
        {
            errors.Add(new AraimParameterError(name, v, $"0 < {name} < 1"));
        }
    }

    private static void Closed(List<AraimParameterError> errors, string name, double v)
    {
        if (!(v >= 0.0 && v <= 1.0))
        {
            errors.Add(new AraimParameterError(name, v, $"0 <= {name} <= 1"));
        }
    }

    private static void HalfOpen(List<AraimParameterError> errors, string name, double v)
    {
        if (!(v >= 0.0 && v < 1.0))
        {
            errors.Add(new AraimParameterError(name, v, $"0 <= {name} < 1"));
        }
    }

    private static void Positive(List<AraimParameterError> errors, string name, double v)
    {
        if (!(v > 0.0) || !double.IsFinite(v))
        {
            errors.Add(new AraimParameterError(name, v, $"0 < {name} < infinity"));
        }
    }

    private static void NonNegative(List<AraimParameterError> errors, string name, double v)
    {
        if (!(v >= 0.0) || !double.IsFinite(v))
        {
            errors.Add(new AraimParameterError(name, v, $"0 <= {name} < infinity"));
        }
    }
}

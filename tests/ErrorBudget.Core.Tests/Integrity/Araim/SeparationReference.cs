namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// The solution-separation detector of REFERENCE-VALUES §5 on plain arrays from <see cref="ReferenceMhss"/>:
/// detection when |(S⁽ᵏ⁾ − S⁽⁰⁾)_q ε| &gt; T_k,q for any k and q; and the exact marginal detection probability
/// of one test under a step b on satellite j, P = Q((T − μ)/σ_ss) + Q((T + μ)/σ_ss), μ = (S⁽ᵏ⁾ − S⁽⁰⁾)_q,j·b.
/// </summary>
internal sealed class SeparationReference
{
    private readonly double[][] _rows; // one row of S⁽ᵏ⁾ − S⁽⁰⁾ per (k, q)
    private readonly double[] _threshold;
    private readonly double[] _sigma;

    public SeparationReference(ReferenceMhss reference)
    {
        var rows = new List<double[]>();
        var t = new List<double>();
        var s = new List<double>();
        foreach (var mode in reference.Modes)
        {
            for (int q = 0; q < 3; q++)
            {
                rows.Add(mode.Delta.Row(q).ToArray());
                t.Add(mode.Threshold[q]);
                s.Add(mode.SigmaSs[q]);
            }
        }

        _rows = rows.ToArray();
        _threshold = t.ToArray();
        _sigma = s.ToArray();
    }

    /// <summary>Detection decision and the smallest | |separation| − T | over all tests (to spot ties).</summary>
    public (bool Detected, double Margin) Decide(ReadOnlySpan<double> error)
    {
        bool detected = false;
        double margin = double.PositiveInfinity;
        for (int t = 0; t < _rows.Length; t++)
        {
            double sep = 0;
            for (int i = 0; i < error.Length; i++)
            {
                sep += _rows[t][i] * error[i];
            }

            detected |= Math.Abs(sep) > _threshold[t];
            margin = Math.Min(margin, Math.Abs(Math.Abs(sep) - _threshold[t]));
        }

        return (detected, margin);
    }

    /// <summary>Marginal detection probabilities of every test under a step of <paramref name="stepMeters"/> on satellite j.</summary>
    public double[] Marginals(int satellite, double stepMeters)
    {
        var p = new double[_rows.Length];
        for (int t = 0; t < _rows.Length; t++)
        {
            double mu = _rows[t][satellite] * stepMeters;
            p[t] = MathNet.Numerics.Distributions.Normal.CDF(0, 1, -(_threshold[t] - mu) / _sigma[t])
                   + MathNet.Numerics.Distributions.Normal.CDF(0, 1, -(_threshold[t] + mu) / _sigma[t]);
        }

        return p;
    }
}

using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Tests.Geometry;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.RootFinding;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// An independent dense-matrix (MathNet) evaluation of the MHSS quantities of REFERENCE-VALUES §5 for a given
/// list of fault-tolerant subsets: S⁽ᵏ⁾ by general inverse, σ, b, σ_ss, T, the PL equation and its root by
/// Brent's method on the log of the integrity risk.
/// </summary>
internal sealed class ReferenceMhss
{
    private readonly AraimParameters _p;

    public ReferenceMhss(AraimSky sky, AraimParameters p, IReadOnlyList<(bool[] Removed, double Prior)> modes, double unmonitoredPrior)
    {
        _p = p;
        Sky = sky;
        UnmonitoredPrior = unmonitoredPrior;
        S0 = Projection(sky, new bool[sky.Count]);
        Sigma0 = Axes(q => Math.Sqrt(Row(S0, q).PointwisePower(2).DotProduct(Vec(sky.IntegrityVariance))));
        Bias0 = Axes(q => Row(S0, q).PointwiseAbs().DotProduct(Vec(sky.Bias)));
        int n = modes.Count;
        double kV = -Normal.InvCDF(0, 1, p.PFalseAlarmVertical / (2.0 * n));
        double kH = -Normal.InvCDF(0, 1, p.PFalseAlarmHorizontal / (4.0 * n));
        foreach (var (removed, prior) in modes)
        {
            var s = Projection(sky, removed);
            var d = s - S0;
            Modes.Add(new Mode(
                removed,
                prior,
                s,
                d,
                Axes(q => Math.Sqrt(Row(s, q).PointwisePower(2).DotProduct(Vec(sky.IntegrityVariance)))),
                Axes(q => Row(s, q).PointwiseAbs().DotProduct(Vec(sky.Bias))),
                Axes(q => Math.Sqrt(Row(d, q).PointwisePower(2).DotProduct(Vec(sky.AccuracyVariance)))),
                Axes(q => ((q == 2 ? kV : kH) * Math.Sqrt(Row(d, q).PointwisePower(2).DotProduct(Vec(sky.AccuracyVariance))))
                          + (p.NominalBiasAccuracyMeters * Row(d, q).PointwiseAbs().Sum()))));
        }
    }

    /// <summary>The reference for the subsets and priors the solver chose (the algebra is recomputed here).</summary>
    public static ReferenceMhss ForSolver(AraimSolver solver, AraimSky sky, AraimParameters p, double unmonitoredPrior)
    {
        var modes = Enumerable.Range(0, solver.ModeCount)
            .Select(k => (Enumerable.Range(0, sky.Count).Select(i => solver.Removes(k, i)).ToArray(), solver.Mode(k).Prior))
            .ToList();
        return new ReferenceMhss(sky, p, modes, unmonitoredPrior);
    }

    public sealed record Mode(
        bool[] Removed, double Prior, Matrix<double> S, Matrix<double> Delta, double[] Sigma, double[] Bias, double[] SigmaSs, double[] Threshold);

    public AraimSky Sky { get; }

    public double UnmonitoredPrior { get; }

    public Matrix<double> S0 { get; }

    public double[] Sigma0 { get; }

    public double[] Bias0 { get; }

    public List<Mode> Modes { get; } = [];

    /// <summary>Integrity risk allocated to one axis: PHMI_VERT·f for U, PHMI_HOR/2·f for E and N, f = 1 − P_nm/(PHMI_VERT + PHMI_HOR).</summary>
    public double Target(int axis) =>
        (axis == 2 ? _p.PhmiVertical : 0.5 * _p.PhmiHorizontal) * (1.0 - (UnmonitoredPrior / (_p.PhmiVertical + _p.PhmiHorizontal)));

    /// <summary>2Q((pl − b⁽⁰⁾)/σ⁽⁰⁾) + Σₖ p_k Q((pl − T_k − b⁽ᵏ⁾)/σ⁽ᵏ⁾), Q(x) = Φ(−x) (MathNet Normal.CDF).</summary>
    public double Risk(int axis, double pl)
    {
        double r = 2.0 * Normal.CDF(0, 1, -(pl - Bias0[axis]) / Sigma0[axis]);
        foreach (var m in Modes)
        {
            r += m.Prior * Normal.CDF(0, 1, -(pl - m.Threshold[axis] - m.Bias[axis]) / m.Sigma[axis]);
        }

        return r;
    }

    /// <summary>The exact root of Risk = Target in [0, 1000] m (Brent, 1e-9 m).</summary>
    public double Root(int axis)
    {
        double target = Target(axis);
        return Brent.FindRoot(x => Math.Log(Risk(axis, x)) - Math.Log(target), 0.0, 1000.0, 1e-9, 500);
    }

    /// <summary>S = (GᵀWG)⁻¹GᵀW with W = diag(1/σ²_int), zero weight on removed satellites.</summary>
    public static Matrix<double> Projection(AraimSky sky, bool[] removed)
    {
        var g = GeometryFixtures.GeometryMatrix(sky.LineOfSight);
        var w = Matrix<double>.Build.DenseOfDiagonalArray(
            Enumerable.Range(0, sky.Count).Select(i => removed[i] ? 0.0 : 1.0 / sky.IntegrityVariance[i]).ToArray());
        return (g.Transpose() * w * g).Inverse() * g.Transpose() * w;
    }

    /// <summary>P(two or more of independent events) = 1 − Π(1 − pᵢ) − Σᵢ pᵢ Π_{j≠i}(1 − pⱼ), in decimal (28 digits).</summary>
    public static double TwoOrMore(IReadOnlyList<double> priors)
    {
        decimal none = 1m, one = 0m;
        for (int i = 0; i < priors.Count; i++)
        {
            decimal pi = (decimal)priors[i];
            decimal others = 1m;
            for (int j = 0; j < priors.Count; j++)
            {
                if (j != i)
                {
                    others *= 1m - (decimal)priors[j];
                }
            }

            none *= 1m - pi;
            one += pi * others;
        }

        return (double)(1m - none - one);
    }

    private static Vector<double> Row(Matrix<double> s, int q) => s.Row(q);

    private static Vector<double> Vec(double[] v) => Vector<double>.Build.DenseOfArray(v);

    private static double[] Axes(Func<int, double> f) => [f(0), f(1), f(2)];
}

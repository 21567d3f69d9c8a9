namespace ErrorBudget.Core.Integrity;

/// <summary>
/// The outcome of the overbounding check of one <see cref="OverboundHistogram"/>
/// (see <see cref="OverboundAnalysis.RequiredInflation"/> for the rule and the symbols).
/// </summary>
/// <param name="Samples">n, the number of normalized errors.</param>
/// <param name="Mean">The sample mean of x, in sigma units.</param>
/// <param name="SigmaRatio">The sample standard deviation of x over the assumed 1 (divisor n - 1).</param>
/// <param name="RequiredInflation">
/// k: the smallest factor such that N(0, k^2) CDF-overbounds the empirical distribution at every evaluated
/// edge. +infinity when an evaluated edge shows the median on the wrong side of 0 (no zero-mean Gaussian
/// overbounds); NaN when no edge passes the finite-sample rule (sample too small).
/// </param>
/// <param name="TailProbabilityChecked">
/// The tail mass down to which both tails were checked: the larger of the two sides' smallest evaluated
/// min(F, 1 - F) (0.5 for a side without an evaluated edge; NaN when nothing was evaluated).
/// </param>
/// <param name="Bounded">RequiredInflation &lt;= 1 exactly: the assumed sigma overbounds as it is.</param>
/// <param name="SamplingTolerance">
/// tau, relative: with probability at least 1 - 2 <see cref="OverboundAnalysis.ToleranceFalseAlarm"/>,
/// RequiredInflation lies within a factor 1 +- tau of the value an infinite sample would give over the same
/// edges. So k &lt;= 1 + tau reads "consistent with 1", k &gt; 1 + tau "the assumed sigma fails". NaN when
/// nothing was evaluated.
/// </param>
/// <param name="CriticalX">The edge x (sigma units) where RequiredInflation is attained; NaN when nothing was evaluated.</param>
/// <param name="EvaluatedEdges">How many edges passed the finite-sample rule.</param>
internal readonly record struct OverboundResult(
    long Samples,
    double Mean,
    double SigmaRatio,
    double RequiredInflation,
    double TailProbabilityChecked,
    bool Bounded,
    double SamplingTolerance,
    double CriticalX,
    int EvaluatedEdges);

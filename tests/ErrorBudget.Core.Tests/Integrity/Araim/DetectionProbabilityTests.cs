using ErrorBudget.Core.Integrity.Araim;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Core.Tests.Integrity.Araim;

/// <summary>
/// Detection under a step fault on one satellite plus nominal errors drawn from C_acc. Each separation is
/// Gaussian with mean (S⁽ᵏ⁾ − S⁽⁰⁾)_q,j·b and sigma σ_ss,q⁽ᵏ⁾ (REFERENCE-VALUES §5), so P(detect) lies between
/// the largest marginal and the union bound Σ marginals; a separate Monte Carlo of the separations alone
/// (MathNet algebra, System.Random) estimates it directly. Binomial tolerances: Clopper-Pearson intervals
/// at two-sided level 1 − 1e-4 (MathNet Beta quantiles).
/// </summary>
public class DetectionProbabilityTests
{
    private const double Alpha = 1e-4;
    private const int Samples = 4000; // CP half-width ≈ 3.9·√(0.25/4000) ≈ 0.03 at p = 0.5

    private static readonly AraimParameters SatelliteFaultsOnly = new() { PConst = 0.0 };

    [Theory]
    [InlineData(0.5)]
    [InlineData(0.2)]
    public void Detection_rate_under_a_step_matches_the_probability_the_thresholds_imply(double largestMarginal)
    {
        var sky = AraimFixtures.RandomSky(new System.Random(41), 9, SatelliteFaultsOnly);
        var solver = new AraimSolver(12, SatelliteFaultsOnly);
        Assert.True(sky.Evaluate(solver, out AraimResult result));
        var reference = new SeparationReference(ReferenceMhss.ForSolver(solver, sky, SatelliteFaultsOnly, result.UnmonitoredPrior));

        const int faulty = 4;
        double step = StepForLargestMarginal(reference, faulty, largestMarginal);
        double[] marginals = reference.Marginals(faulty, step);
        double lower = marginals.Max(), upper = Math.Min(1.0, marginals.Sum());

        // Solver on CounterRng samples; the reference decides on the very same samples.
        ulong key = CounterRng.Key(2718, RandomPurpose.UserLocal, 0, 0, 0);
        int m = sky.Count, detected = 0, disagreements = 0;
        var error = new double[m];
        var position = new double[3];
        for (int s = 0; s < Samples; s++)
        {
            CounterRng.FillNormals(key, (ulong)(s * m), error);
            for (int i = 0; i < m; i++)
            {
                error[i] = (error[i] * Math.Sqrt(sky.AccuracyVariance[i])) + (i == faulty ? step : 0.0);
            }

            bool d = solver.Test(error, position).Detected;
            detected += d ? 1 : 0;
            var (refDetected, margin) = reference.Decide(error);
            disagreements += d != refDetected && margin > 1e-9 ? 1 : 0;
        }

        Assert.Equal(0, disagreements);

        // An independent Monte Carlo of the separations (System.Random, MathNet normals).
        var rng = new System.Random(31415);
        int refCount = 0;
        for (int s = 0; s < Samples; s++)
        {
            for (int i = 0; i < m; i++)
            {
                error[i] = (MathNet.Numerics.Distributions.Normal.Sample(rng, 0, 1) * Math.Sqrt(sky.AccuracyVariance[i])) + (i == faulty ? step : 0.0);
            }

            refCount += reference.Decide(error).Detected ? 1 : 0;
        }

        var (low, high) = AraimFixtures.ClopperPearson(detected, Samples, Alpha);
        var (refLow, refHigh) = AraimFixtures.ClopperPearson(refCount, Samples, Alpha);
        Assert.True(high >= lower && low <= upper, $"rate {detected / (double)Samples:F4} outside [{lower:F4}, {upper:F4}]");
        Assert.True(high >= refLow && low <= refHigh, $"rate {detected / (double)Samples:F4} vs separations-only {refCount / (double)Samples:F4}");
    }

    /// <summary>The step b ≥ 0 at which the most sensitive single test detects with probability <paramref name="target"/> (bisection).</summary>
    private static double StepForLargestMarginal(SeparationReference reference, int satellite, double target)
    {
        double lo = 0, hi = 1000;
        for (int i = 0; i < 100; i++)
        {
            double mid = 0.5 * (lo + hi);
            if (reference.Marginals(satellite, mid).Max() < target)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return hi;
    }
}

using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;
using ErrorBudget.Core.Tests.Geometry;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>The integrity tests' hand-picked sky and the tool's covariance; general skies and reference algebra are in <see cref="GeometryFixtures"/>.</summary>
internal static class IntegrityFixtures
{
    /// <summary>
    /// Five satellites (azimuth °, elevation °, σ m) chosen by hand, deliberately asymmetric so that d_EN is far from zero.
    /// </summary>
    public static readonly (double Az, double El, double Sigma)[] HandPickedSky =
        [(30, 70, 0.8), (100, 35, 1.2), (190, 20, 2.0), (260, 50, 1.0), (330, 10, 3.0)];

    public static Vec3[] HandPickedLinesOfSight() => HandPickedSky.Select(s => GeometryFixtures.LineOfSight(s.Az, s.El)).ToArray();

    public static double[] HandPickedWeights() => HandPickedSky.Select(s => 1.0 / (s.Sigma * s.Sigma)).ToArray();

    /// <summary>The tool's covariance (GᵀWG)⁻¹, 4 × 4 row-major; fails the test if the geometry is unsolvable.</summary>
    public static double[] Covariance(Vec3[] los, double[] weights)
    {
        var projection = new double[4 * los.Length];
        var covariance = new double[16];
        Assert.True(PositionSolution.TrySolve(los, weights, projection, covariance, out _), "geometry not solvable");
        return covariance;
    }
}

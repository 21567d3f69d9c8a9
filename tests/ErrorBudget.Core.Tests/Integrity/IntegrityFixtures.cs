using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace ErrorBudget.Core.Tests.Integrity;

/// <summary>Skies and independent (MathNet) reference algebra shared by the integrity tests.</summary>
internal static class IntegrityFixtures
{
    /// <summary>Unit line of sight in ENU: [cos El sin Az, cos El cos Az, sin El].</summary>
    public static Vec3 LineOfSight(double azimuthDeg, double elevationDeg)
    {
        double az = azimuthDeg * Math.PI / 180.0, el = elevationDeg * Math.PI / 180.0;
        return new Vec3(Math.Cos(el) * Math.Sin(az), Math.Cos(el) * Math.Cos(az), Math.Sin(el));
    }

    /// <summary>
    /// Five satellites (azimuth °, elevation °, σ m) chosen by hand, deliberately asymmetric so that d_EN is far from zero.
    /// </summary>
    public static readonly (double Az, double El, double Sigma)[] HandPickedSky =
        [(30, 70, 0.8), (100, 35, 1.2), (190, 20, 2.0), (260, 50, 1.0), (330, 10, 3.0)];

    public static Vec3[] HandPickedLinesOfSight() => HandPickedSky.Select(s => LineOfSight(s.Az, s.El)).ToArray();

    public static double[] HandPickedWeights() => HandPickedSky.Select(s => 1.0 / (s.Sigma * s.Sigma)).ToArray();

    /// <summary>m satellites, azimuth uniform in [0°, 360°), elevation uniform in [5°, 90°].</summary>
    public static Vec3[] RandomSky(System.Random rng, int m) =>
        Enumerable.Range(0, m).Select(_ => LineOfSight(360.0 * rng.NextDouble(), 5.0 + (85.0 * rng.NextDouble()))).ToArray();

    /// <summary>Weights 1/σ² with σ uniform in [0.3, 5] m.</summary>
    public static double[] RandomWeights(System.Random rng, int m) =>
        Enumerable.Range(0, m).Select(_ => { double s = 0.3 + (4.7 * rng.NextDouble()); return 1.0 / (s * s); }).ToArray();

    /// <summary>The tool's covariance (GᵀWG)⁻¹, 4 × 4 row-major; fails the test if the geometry is unsolvable.</summary>
    public static double[] Covariance(Vec3[] los, double[] weights)
    {
        var projection = new double[4 * los.Length];
        var covariance = new double[16];
        Assert.True(PositionSolution.TrySolve(los, weights, projection, covariance, out _), "geometry not solvable");
        return covariance;
    }

    /// <summary>G with rows [−cos El sin Az, −cos El cos Az, −sin El, 1] (RTCA DO-229 appendix J geometry row).</summary>
    public static Matrix<double> GeometryMatrix(Vec3[] los) =>
        Matrix<double>.Build.Dense(los.Length, 4, (i, j) => j switch
        {
            0 => -los[i].X,
            1 => -los[i].Y,
            2 => -los[i].Z,
            _ => 1.0,
        });
}

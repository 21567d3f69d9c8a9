using BenchmarkDotNet.Attributes;
using ErrorBudget.Core.Geometry;
using ErrorBudget.Core.Numerics;

namespace ErrorBudget.Benchmarks;

/// <summary>The per-(epoch, user) geometry: weighted least squares, projection S, DOPs, for 9 satellites.</summary>
[MemoryDiagnoser]
public class ProjectionBenchmarks
{
    private readonly Vec3[] _lineOfSight = new Vec3[9];
    private readonly double[] _weights = new double[9];
    private readonly double[] _projection = new double[36];
    private readonly double[] _covariance = new double[16];
    private readonly double[] _variances = new double[9];
    private readonly double[] _enu = new double[9];

    [GlobalSetup]
    public void Setup()
    {
        for (int i = 0; i < 9; i++)
        {
            double el = (10 + (9 * i)) * Math.PI / 180, az = i * 40 * Math.PI / 180;
            _lineOfSight[i] = new Vec3(Math.Cos(el) * Math.Sin(az), Math.Cos(el) * Math.Cos(az), Math.Sin(el));
            _weights[i] = 1.0 / (1.0 + (1.0 / Math.Sin(el)));
            _variances[i] = 1.0 / _weights[i];
        }
    }

    [Benchmark]
    public bool SolveNineSatellites() => PositionSolution.TrySolve(_lineOfSight, _weights, _projection, _covariance, out _);

    [Benchmark]
    public void ProjectCovariance() => PositionSolution.ProjectCovariance(_projection, 9, _variances, _enu);
}

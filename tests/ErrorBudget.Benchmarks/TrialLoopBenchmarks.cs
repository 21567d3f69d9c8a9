using BenchmarkDotNet.Attributes;
using ErrorBudget.Core.Random;
using ErrorBudget.Core.Simulation;

namespace ErrorBudget.Benchmarks;

/// <summary>
/// The hot loop of one (epoch, user): 9 visible satellites, 100 trials in 112 lanes, satellite errors through
/// the projection plus L z, HPE/VPE sketch keys and the bulk inserts (vector and scalar twins).
/// </summary>
[MemoryDiagnoser]
public class TrialLoopBenchmarks
{
    private const int Satellites = 30;
    private const int Visible = 9;
    private const int Trials = 100;
    private const int Lanes = 112; // 100 trials rounded up to the 16 of the 512-bit path
    private readonly float[] _errors = new float[Satellites * 4 * Lanes];
    private TileScratch _scratch = null!;
    private CellAccumulator _cell = null!;

    [GlobalSetup]
    public void Setup()
    {
        _scratch = new TileScratch(Satellites, Lanes, 0.005);
        _cell = new CellAccumulator(0.005);
        SingleNormals.Fill(CounterRng.Key(3, RandomPurpose.Spare, 0, 0, 0), 0, _errors);
        SingleNormals.Fill(CounterRng.Key(4, RandomPurpose.Spare, 0, 0, 0), 0, _scratch.Normals);
        for (int i = 0; i < Visible; i++)
        {
            _scratch.Visible[i] = 3 * i;
            double el = (10 + (9 * i)) * Math.PI / 180, az = i * 40 * Math.PI / 180;
            _scratch.LineOfSight[i] = new(Math.Cos(el) * Math.Sin(az), Math.Cos(el) * Math.Cos(az), Math.Sin(el));
            for (int q = 0; q < 4; q++)
            {
                _scratch.Projection[(q * Visible) + i] = ((q + 1) * 0.1) - (i * 0.02);
            }
        }

        _scratch.Cholesky3[0] = 1.0;
        _scratch.Cholesky3[3] = 0.2;
        _scratch.Cholesky3[4] = 0.9;
        _scratch.Cholesky3[6] = 0.1;
        _scratch.Cholesky3[7] = 0.3;
        _scratch.Cholesky3[8] = 1.7;
        _scratch.RoundForTrialLoop();
        TileKernel.BuildCoefficients(Visible, _scratch);
    }

    [Benchmark(Baseline = true, OperationsPerInvoke = Trials)]
    public void VectorTrials() => TrialSampler.SampleVector(Visible, Trials, _errors, _cell, 3, _scratch);

    /// <summary>Eight trials per vector (what <see cref="VectorTrials"/> runs without AVX-512).</summary>
    [Benchmark(OperationsPerInvoke = Trials)]
    public void Vector256Trials() => TrialSampler.SampleNarrow(Visible, Trials, _errors, _cell, 3, _scratch);

    [Benchmark(OperationsPerInvoke = Trials)]
    public void ScalarTrials() => TrialSampler.SampleScalar(Visible, Trials, _errors, _cell, 3, _scratch);
}

using BenchmarkDotNet.Attributes;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Benchmarks;

/// <summary>
/// The counter-based normal generators on one block of normals: the double-precision one (satellite-level
/// errors, ARAIM) and the single-precision one of the user-level normals, vector (widest, and 256-bit) and scalar forms.
/// </summary>
[MemoryDiagnoser]
public class NormalGeneratorBenchmarks
{
    private readonly double[] _buffer = new double[1024];
    private readonly float[] _single = new float[1024];
    private readonly ulong _key = CounterRng.Key(1, RandomPurpose.UserLocal, 2, 3, 4);

    [Benchmark(Baseline = true, OperationsPerInvoke = 1024)]
    public void VectorNormals() => CounterRng.FillNormals(_key, 0, _buffer);

    [Benchmark(OperationsPerInvoke = 1024)]
    public void ScalarNormals() => CounterRng.FillNormalsScalar(_key, 0, _buffer);

    [Benchmark(OperationsPerInvoke = 1024)]
    public void VectorSingleNormals() => SingleNormals.Fill(_key, 0, _single);

    /// <summary>The same fill held to eight lanes (the 512-bit path's twin, for machines that compare them).</summary>
    [Benchmark(OperationsPerInvoke = 1024)]
    public void Vector256SingleNormals() => SingleNormals.Fill(_key, 0, _single, 256);

    [Benchmark(OperationsPerInvoke = 1024)]
    public void ScalarSingleNormals()
    {
        for (int i = 0; i < _single.Length; i++)
        {
            _single[i] = SingleNormals.OfTrial(_key, i);
        }
    }
}

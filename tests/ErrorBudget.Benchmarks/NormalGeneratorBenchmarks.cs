using BenchmarkDotNet.Attributes;
using ErrorBudget.Core.Random;

namespace ErrorBudget.Benchmarks;

/// <summary>The counter-based normal generator: one block of user-level normals (vector and scalar twins).</summary>
[MemoryDiagnoser]
public class NormalGeneratorBenchmarks
{
    private readonly double[] _buffer = new double[1024];
    private readonly ulong _key = CounterRng.Key(1, RandomPurpose.UserLocal, 2, 3, 4);

    [Benchmark(Baseline = true, OperationsPerInvoke = 1024)]
    public void VectorNormals() => CounterRng.FillNormals(_key, 0, _buffer);

    [Benchmark(OperationsPerInvoke = 1024)]
    public void ScalarNormals() => CounterRng.FillNormalsScalar(_key, 0, _buffer);
}

using BenchmarkDotNet.Attributes;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Benchmarks;

/// <summary>Sketch keys and bulk inserts as the kernel does them: 100 trials' keys into a cell sketch and an epoch share (and a trial batch).</summary>
[MemoryDiagnoser]
public class SketchInsertBenchmarks
{
    private readonly DDSketch _cell = new(0.005);
    private readonly DDSketch _share = new(0.005);
    private readonly int[] _keys = new int[100];
    private readonly double[] _values = new double[100];
    private readonly BatchSketchSet _batches = new(0.005, 10);

    [GlobalSetup]
    public void Setup()
    {
        var random = new System.Random(7);
        for (int i = 0; i < _values.Length; i++)
        {
            _values[i] = Math.Abs(2.0 * (random.NextDouble() + random.NextDouble() - 1.0)) + 0.01;
            _keys[i] = _cell.KeyOf(_values[i]);
        }

        _batches.SetBlock(0, _keys.Length, _keys.Length);
    }

    [Benchmark(OperationsPerInvoke = 100)]
    public void KeysOfValues()
    {
        for (int i = 0; i < _values.Length; i++)
        {
            _keys[i] = _cell.KeyOf(_values[i]);
        }
    }

    [Benchmark(OperationsPerInvoke = 100)]
    public void InsertIntoCellAndEpochShare() => DDSketch.AddKeysToBoth(_keys, _cell, 1, _share, 37);

    /// <summary>The W1 insert: each key also to its trial's batch (ten batches of 10 trials).</summary>
    [Benchmark(OperationsPerInvoke = 100)]
    public void InsertIntoCellEpochShareAndBatch() => DDSketch.AddKeysBatched(_keys, _cell, 1, _share, 37, _batches);
}

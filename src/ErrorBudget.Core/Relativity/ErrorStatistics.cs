namespace ErrorBudget.Core.Relativity;

/// <summary>Running rms and largest magnitude of an error, in the error's unit (metres here).</summary>
public struct ErrorStatistics
{
    private double _sumOfSquares;

    /// <summary>Values added.</summary>
    public long Count { get; private set; }

    /// <summary>Largest |value| added; NaN when none.</summary>
    public readonly double MaxAbs => Count == 0 ? double.NaN : _maxAbs;

    /// <summary>sqrt(mean of squares); NaN when none.</summary>
    public readonly double Rms => Count == 0 ? double.NaN : Math.Sqrt(_sumOfSquares / Count);

    private double _maxAbs;

    public void Add(double value)
    {
        _sumOfSquares += value * value;
        _maxAbs = Math.Max(_maxAbs, Math.Abs(value));
        Count++;
    }

    /// <summary>Adds every value behind <paramref name="other"/> (rms pooled over both, largest of both).</summary>
    public void Merge(in ErrorStatistics other)
    {
        _sumOfSquares += other._sumOfSquares;
        _maxAbs = Math.Max(_maxAbs, other._maxAbs);
        Count += other.Count;
    }
}

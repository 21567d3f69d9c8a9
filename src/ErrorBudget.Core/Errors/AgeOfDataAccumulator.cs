using System.Runtime.CompilerServices;
using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Errors;

/// <summary>
/// Bins the satellite-level clock and orbit range errors by age of data: <see cref="Bins"/> equal bins over
/// [0, max age of data]. Single-threaded (the sampler runs one epoch at a time).
/// </summary>
internal sealed class AgeOfDataAccumulator
{
    /// <summary>Number of age bins.</summary>
    public const int Bins = 24;

    /// <summary>Sketch accuracy of the percentiles (DDSketch alpha), as for the position errors.</summary>
    public const double SketchAccuracy = 0.005;

    /// <summary>Orbit-only URE weight of the radial error at GPS-like altitude (common practice).</summary>
    public const double RadialWeight = 0.98;

    /// <summary>Orbit-only URE weight of the squared along- and cross-track errors at GPS-like altitude: 1/49 (common practice).</summary>
    public const double TangentialWeightSquared = 1.0 / 49.0;

    private readonly double _width;
    private readonly long[] _count = new long[Bins];
    // Order-free sums, so the figures do not depend on how the trials are split into blocks.
    private readonly FixedPointSum[] _ageSum = new FixedPointSum[Bins];
    private readonly FixedPointSum[] _clockSquares = new FixedPointSum[Bins];
    private readonly FixedPointSum[] _modelSquares = new FixedPointSum[Bins];
    private readonly FixedPointSum[] _orbitSquares = new FixedPointSum[Bins];
    private readonly DDSketch[] _clock = new DDSketch[Bins];
    private readonly DDSketch[] _orbit = new DDSketch[Bins];

    /// <param name="maxAgeSeconds">Largest age of data possible. Range: &gt; 0 s.</param>
    public AgeOfDataAccumulator(double maxAgeSeconds)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(maxAgeSeconds);
        _width = maxAgeSeconds / Bins;
        for (int i = 0; i < Bins; i++)
        {
            _clock[i] = new DDSketch(SketchAccuracy);
            _orbit[i] = new DDSketch(SketchAccuracy);
        }
    }

    /// <summary>The bin of an age (ages beyond the last edge go to the last bin).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public int BinOf(double ageSeconds) => Math.Clamp((int)(ageSeconds / _width), 0, Bins - 1);

    /// <summary>
    /// Orbit-only URE from the radial, along- and cross-track errors (m): sqrt((0.98 r)^2 + (a^2 + c^2)/49), the usual
    /// weights at GPS altitude (common practice), used for every shell.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double OrbitUre(double radial, double along, double cross)
    {
        double r = RadialWeight * radial;
        return Math.Sqrt(r * r + (along * along + cross * cross) * TangentialWeightSquared);
    }

    /// <summary>Adds one satellite-trial sample.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public void Add(int bin, double clockRangeMeters, double orbitUreMeters)
    {
        _clockSquares[bin].Add(clockRangeMeters * clockRangeMeters);
        _orbitSquares[bin].Add(orbitUreMeters * orbitUreMeters);
        _clock[bin].AddKey(_clock[bin].KeyOf(Math.Abs(clockRangeMeters)), 1);
        _orbit[bin].AddKey(_orbit[bin].KeyOf(orbitUreMeters), 1);
    }

    /// <summary>Counts <paramref name="trials"/> samples of one satellite at one epoch, with their age and model mean square.</summary>
    public void AddEpoch(int bin, double ageSeconds, double modelMeanSquare, int trials)
    {
        _count[bin] += trials;
        _ageSum[bin].Add(ageSeconds, trials);
        _modelSquares[bin].Add(modelMeanSquare, trials);
    }

    /// <summary>One row per bin, youngest first.</summary>
    public IReadOnlyList<AgeOfDataRow> Rows()
    {
        var rows = new AgeOfDataRow[Bins];
        for (int i = 0; i < Bins; i++)
        {
            long n = _count[i];
            double Rms(FixedPointSum sum) => n == 0 ? double.NaN : Math.Sqrt(sum.Value / n);
            double P95(DDSketch s) => n * 0.05 < 1.0 - 1e-9 ? double.NaN : s.Quantile(0.95);
            rows[i] = new AgeOfDataRow(
                i, i * _width, (i + 1) * _width, n == 0 ? double.NaN : _ageSum[i].Value / n, n,
                Rms(_clockSquares[i]), P95(_clock[i]), Rms(_modelSquares[i]), Rms(_orbitSquares[i]), P95(_orbit[i]));
        }

        return rows;
    }
}

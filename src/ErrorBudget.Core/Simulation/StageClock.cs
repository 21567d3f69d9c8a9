using System.Diagnostics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Thread time per stage of a run, in Stopwatch ticks, when <see cref="RunOptions.MeasureStages"/> is
/// on (the benchmark): one per worker, summed at the end. Taking the timestamps costs a few per cent.
/// </summary>
internal sealed class StageClock
{
    public long Geometry;
    public long UserNormals;
    public long Projection;
    public long Sketches;
    public long Integrity;

    public static long Now => Stopwatch.GetTimestamp();

    public void Add(StageClock other)
    {
        Geometry += other.Geometry;
        UserNormals += other.UserNormals;
        Projection += other.Projection;
        Sketches += other.Sketches;
        Integrity += other.Integrity;
    }
}

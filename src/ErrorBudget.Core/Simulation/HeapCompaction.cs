namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Keeps a large run's heap near its live size. The cells' sketch stores grow while the run goes, and
/// the stores they replace die in generation 2, where the collector leaves them (and the holes they
/// leave) until its own budget says so: on the 1-degree grid with 1,000 trials the peak was 1.05 GiB for
/// about 0.7 GiB live; with this 851 MiB (growth by a twentieth; 934 - 980 MiB with a tenth, whose four
/// compactions left the run time unchanged). After an epoch, when the managed heap has grown by a
/// twentieth since the last compaction and holds at least <see cref="MinimumBytes"/>, one blocking
/// compacting collection returns it to its live size (a few tenths of a second each, a few per large
/// run; never for small runs). Issue 6, memory.
/// </summary>
internal sealed class HeapCompaction
{
    /// <summary>Below this managed heap size nothing is done, bytes.</summary>
    public const long MinimumBytes = 256L << 20;

    private const double Growth = 1.05;

    private readonly Lock _gate = new();
    private long _liveAfterLast;

    /// <summary>Called once per finished epoch, from any thread.</summary>
    public void AfterEpoch()
    {
        long now = GC.GetTotalMemory(forceFullCollection: false);
        if (now < MinimumBytes || now < _liveAfterLast * Growth)
        {
            return;
        }

        lock (_gate)
        {
            if (GC.GetTotalMemory(false) < Math.Max(MinimumBytes, _liveAfterLast * Growth))
            {
                return; // another thread has just compacted
            }

            GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: true);
            _liveAfterLast = GC.GetTotalMemory(false);
        }
    }
}

namespace ErrorBudget.Core.Simulation;

/// <summary>One unit of parallel work: the users of one tile at one (epoch, trial block).</summary>
internal sealed record TileJob(EpochWork Work, Tile Tile);

/// <summary>A contiguous range of grid cells [First, First + Count) and the lock that serialises its accumulators.</summary>
internal sealed record Tile(int Index, int First, int Count)
{
    public object Gate { get; } = new();
}

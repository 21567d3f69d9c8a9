namespace ErrorBudget.Core.Simulation;

/// <summary>One unit of parallel work: the users of one tile over a few consecutive (epoch, trial block) items.</summary>
internal sealed record TileJob(EpochWork[] Batch, Tile Tile);

/// <summary>A contiguous range of grid cells [First, First + Count) and the lock that serialises its accumulators.</summary>
internal sealed record Tile(int Index, int First, int Count)
{
    public object Gate { get; } = new();
}

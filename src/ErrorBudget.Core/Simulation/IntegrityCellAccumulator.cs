using ErrorBudget.Core.Statistics;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// What one cell accumulates for [integrity]: protection levels per epoch, availability, and the
/// per-sample integrity events. Integer counts only, so the order of arrival does not matter.
/// </summary>
/// <remarks>
/// The protection-level sketches get weight 1 per solved epoch of this cell, so they use compact
/// (32-bit) counts, as the cell's error sketches do (<see cref="CellAccumulator"/>).
/// </remarks>
internal sealed class IntegrityCellAccumulator(double relativeAccuracy)
{
    public DDSketch Hpl { get; } = new(relativeAccuracy, compactCounts: true);
    public DDSketch Vpl { get; } = new(relativeAccuracy, compactCounts: true);

    /// <summary>Epochs with a position solution and PL &lt;= AL on every axis the service has.</summary>
    public long AvailableEpochs;

    /// <summary>Epochs with a position solution (the protection levels exist).</summary>
    public long SolvedEpochs;

    /// <summary>Position-error samples evaluated against the protection levels.</summary>
    public long Samples;

    /// <summary>Samples at available epochs (and, with ARAIM, not flagged by detection).</summary>
    public long AvailableSamples;

    /// <summary>Misleading information: HPE &gt; HPL, VPE &gt; VPL.</summary>
    public long MisleadingHorizontal;
    public long MisleadingVertical;

    /// <summary>Hazardously misleading information: error &gt; alert limit while the service is declared available.</summary>
    public long HazardousHorizontal;
    public long HazardousVertical;

    /// <summary>ARAIM fault detection: samples with a detection, with an exclusion, faulted samples, faulted samples not detected.</summary>
    public long Detections;
    public long Exclusions;
    public long FaultedSamples;
    public long MissedDetections;
}

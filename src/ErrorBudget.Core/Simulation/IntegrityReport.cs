using ErrorBudget.Core.Integrity;

namespace ErrorBudget.Core.Simulation;

/// <summary>The [integrity] outputs of a run: per cell, global, the integrity diagrams and the overbounding check.</summary>
public sealed record IntegrityReport(
    string Service,
    string Method,
    double HorizontalAlertLimitMeters,
    double VerticalAlertLimitMeters,
    double AvailabilityTarget,
    IReadOnlyList<IntegrityCellRow> Cells,
    IntegrityGlobal Global,
    IReadOnlyList<IntegrityDiagramRow> Diagram,
    IReadOnlyList<OverboundRow> Overbound);

/// <summary>One cell's availability and integrity events (availability.parquet).</summary>
public sealed record IntegrityCellRow(
    int CellIndex,
    double LatDeg,
    double LonDeg,
    double AreaWeight,
    long Epochs,
    double Availability,
    double HplP50,
    double HplP95,
    double VplP50,
    double VplP95,
    long Samples,
    long AvailableSamples,
    long MisleadingHorizontal,
    long MisleadingVertical,
    long HazardousHorizontal,
    long HazardousVertical,
    long Detections,
    long Exclusions,
    long FaultedSamples,
    long MissedDetections)
{
    /// <summary>95 % Clopper-Pearson upper bounds of the cell's rates: MI over all samples, HMI over the available ones.</summary>
    public double MisleadingHorizontalUpper => EventRate.Of(MisleadingHorizontal, Samples).Upper;
    public double MisleadingVerticalUpper => EventRate.Of(MisleadingVertical, Samples).Upper;
    public double HazardousHorizontalUpper => EventRate.Of(HazardousHorizontal, AvailableSamples).Upper;
    public double HazardousVerticalUpper => EventRate.Of(HazardousVertical, AvailableSamples).Upper;
}

/// <summary>A count of events among samples, its rate and the 95 % Clopper-Pearson interval of the rate.</summary>
public sealed record EventRate(long Events, long Samples, double Rate, double Lower, double Upper)
{
    public const double Confidence = 0.95;

    public static EventRate Of(long events, long samples)
    {
        if (samples <= 0)
        {
            return new EventRate(events, samples, double.NaN, double.NaN, double.NaN);
        }

        var (lower, upper) = BinomialInterval.ClopperPearson(events, samples, Confidence);
        return new EventRate(events, samples, (double)events / samples, lower, upper);
    }
}

/// <summary>Service-area figures: area-weighted availability, coverage, and the event rates over all samples.</summary>
public sealed record IntegrityGlobal(
    double Availability,
    double Coverage,
    EventRate MisleadingHorizontal,
    EventRate MisleadingVertical,
    EventRate HazardousHorizontal,
    EventRate HazardousVertical,
    EventRate Detections,
    EventRate MissedDetections,
    long Exclusions,
    long FaultedSamples,
    double WorstRequiredInflation,
    string WorstOverboundGroup)
{
    /// <summary>The service's 95 % accuracy requirements (NaN: none) and the area-weighted share of cells meeting both.</summary>
    public double HorizontalAccuracy95Meters { get; init; } = double.NaN;
    public double VerticalAccuracy95Meters { get; init; } = double.NaN;
    public double AccuracyAreaShare { get; init; } = double.NaN;
}

/// <summary>One non-empty cell of an integrity diagram (integrity.parquet).</summary>
public sealed record IntegrityDiagramRow(
    string Axis,
    double PlLowMeters,
    double PlHighMeters,
    double ErrorLowMeters,
    double ErrorHighMeters,
    long Count,
    double AlertLimitMeters);

/// <summary>
/// The overbounding check of one (shell, elevation bin) (overbound.parquet). Bounded: the required
/// inflation is within 1 + its sampling tolerance.
/// </summary>
public sealed record OverboundRow(
    string Shell,
    double ElevationLowDeg,
    double ElevationHighDeg,
    long Samples,
    double Mean,
    double SigmaRatio,
    double RequiredInflation,
    double TailProbabilityChecked,
    double SamplingTolerance,
    bool Bounded);

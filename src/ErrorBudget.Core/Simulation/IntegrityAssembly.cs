using ErrorBudget.Core.Integrity;

namespace ErrorBudget.Core.Simulation;

/// <summary>Builds the [integrity] report from the cells' accumulators and the workers' diagrams and histograms.</summary>
internal static class IntegrityAssembly
{
    public static IntegrityReport Build(SimulationSetup setup, IntegrityKernel kernel, CellAccumulator[] cells, IReadOnlyList<TileScratch> scratches, IReadOnlyList<CellResult> cellResults)
    {
        var spec = kernel.Spec;
        var rows = new IntegrityCellRow[cells.Length];
        double weightSum = 0, availableWeighted = 0, coveredWeight = 0;
        long samples = 0, availableSamples = 0, miH = 0, miV = 0, hmiH = 0, hmiV = 0, detections = 0, exclusions = 0, faulted = 0, missed = 0;
        for (int i = 0; i < cells.Length; i++)
        {
            CellAccumulator c = cells[i];
            IntegrityCellAccumulator a = c.Integrity!;
            var g = setup.Grid.Cells[i];
            double availability = c.Epochs == 0 ? double.NaN : (double)a.AvailableEpochs / c.Epochs;
            rows[i] = new IntegrityCellRow(
                i, g.LatDeg, g.LonDeg, g.AreaWeight, c.Epochs, availability,
                PercentileReport.Percentile(a.Hpl, a.SolvedEpochs, 0.50),
                PercentileReport.Percentile(a.Hpl, a.SolvedEpochs, 0.95),
                PercentileReport.Percentile(a.Vpl, a.SolvedEpochs, 0.50),
                PercentileReport.Percentile(a.Vpl, a.SolvedEpochs, 0.95),
                a.Samples, a.AvailableSamples, a.MisleadingHorizontal, a.MisleadingVertical, a.HazardousHorizontal, a.HazardousVertical,
                a.Detections, a.Exclusions, a.FaultedSamples, a.MissedDetections);
            weightSum += g.AreaWeight;
            double av = double.IsNaN(availability) ? 0.0 : availability;
            availableWeighted += g.AreaWeight * av;
            coveredWeight += av >= spec.AvailabilityTarget ? g.AreaWeight : 0.0;
            samples += a.Samples;
            availableSamples += a.AvailableSamples;
            miH += a.MisleadingHorizontal;
            miV += a.MisleadingVertical;
            hmiH += a.HazardousHorizontal;
            hmiV += a.HazardousVertical;
            detections += a.Detections;
            exclusions += a.Exclusions;
            faulted += a.FaultedSamples;
            missed += a.MissedDetections;
        }

        var overbound = Overbound(setup, kernel, scratches);
        OverboundRow? worst = overbound.Where(r => !double.IsNaN(r.RequiredInflation)).MaxBy(r => r.RequiredInflation);
        var global = new IntegrityGlobal(
            weightSum > 0 ? availableWeighted / weightSum : double.NaN,
            weightSum > 0 ? coveredWeight / weightSum : double.NaN,
            EventRate.Of(miH, samples),
            EventRate.Of(miV, samples),
            EventRate.Of(hmiH, availableSamples),
            EventRate.Of(hmiV, availableSamples),
            EventRate.Of(detections, samples),
            EventRate.Of(missed, faulted),
            exclusions,
            faulted,
            worst?.RequiredInflation ?? double.NaN,
            worst is null ? "" : $"{worst.Shell} {worst.ElevationLowDeg:0}-{worst.ElevationHighDeg:0} deg")
        {
            HorizontalAccuracy95Meters = spec.HorizontalAccuracy95Meters,
            VerticalAccuracy95Meters = spec.VerticalAccuracy95Meters,
            AccuracyAreaShare = AccuracyShare(spec, cellResults, weightSum),
        };
        return new IntegrityReport(
            spec.Service,
            spec.Method == Scenarios.ProtectionLevelMethod.Araim ? "araim" : "weighted",
            spec.HorizontalAlertLimitMeters,
            spec.VerticalAlertLimitMeters,
            spec.AvailabilityTarget,
            rows,
            global,
            Diagram(spec, scratches),
            overbound);
    }

    /// <summary>Area share of cells whose HPE and VPE 95th percentiles meet the requirements that exist; NaN without any.</summary>
    private static double AccuracyShare(Scenarios.IntegritySpec spec, IReadOnlyList<CellResult> cells, double weightSum)
    {
        bool h = !double.IsNaN(spec.HorizontalAccuracy95Meters), v = !double.IsNaN(spec.VerticalAccuracy95Meters);
        if ((!h && !v) || weightSum <= 0)
        {
            return double.NaN;
        }

        double met = 0;
        foreach (var c in cells)
        {
            bool ok = (!h || c.Hpe.P95 <= spec.HorizontalAccuracy95Meters) && (!v || c.Vpe.P95 <= spec.VerticalAccuracy95Meters);
            met += ok ? c.AreaWeight : 0.0;
        }

        return met / weightSum;
    }

    private static List<IntegrityDiagramRow> Diagram(Scenarios.IntegritySpec spec, IReadOnlyList<TileScratch> scratches)
    {
        var horizontal = new IntegrityDiagram(IntegrityDiagramAxis.Horizontal);
        var vertical = new IntegrityDiagram(IntegrityDiagramAxis.Vertical);
        foreach (var s in scratches)
        {
            horizontal.Merge(s.Integrity!.Horizontal);
            vertical.Merge(s.Integrity!.Vertical);
        }

        var rows = new List<IntegrityDiagramRow>();
        Add(rows, horizontal, "horizontal", spec.HorizontalAlertLimitMeters);
        Add(rows, vertical, "vertical", spec.VerticalAlertLimitMeters);
        return rows;
    }

    private static void Add(List<IntegrityDiagramRow> rows, IntegrityDiagram d, string axis, double alertLimit)
    {
        foreach (var cell in d.NonEmptyCells())
        {
            rows.Add(new IntegrityDiagramRow(
                axis, d.LowerEdge(cell.PlBin), d.UpperEdge(cell.PlBin), d.LowerEdge(cell.ErrorBin), d.UpperEdge(cell.ErrorBin), cell.Count, alertLimit));
        }
    }

    private static List<OverboundRow> Overbound(SimulationSetup setup, IntegrityKernel kernel, IReadOnlyList<TileScratch> scratches)
    {
        var rows = new List<OverboundRow>();
        for (int group = 0; group < kernel.OverboundGroups; group++)
        {
            var merged = new OverboundHistogram();
            foreach (var s in scratches)
            {
                merged.Merge(s.Integrity!.Overbound[group]);
            }

            if (merged.Count == 0)
            {
                continue;
            }

            OverboundResult r = OverboundAnalysis.RequiredInflation(merged);
            int shell = group / IntegrityKernel.ElevationBins;
            int bin = group % IntegrityKernel.ElevationBins;
            rows.Add(new OverboundRow(
                setup.Scenario.Shells[shell].Name, bin * 10.0, (bin + 1) * 10.0, r.Samples, r.Mean, r.SigmaRatio,
                r.RequiredInflation, r.TailProbabilityChecked, r.SamplingTolerance,
                r.RequiredInflation <= 1.0 + r.SamplingTolerance)); // within the sampling uncertainty of k
        }

        return rows;
    }
}

using ErrorBudget.Core.Integrity;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Per-worker integrity buffers and the worker's share of the run-wide integrity diagrams and
/// overbounding histograms (merged once at the end: integer counts, so the result does not depend
/// on which worker saw what).
/// </summary>
internal sealed class IntegrityScratch
{
    public IntegrityScratch(int laneCapacity, int overboundGroups)
    {
        HpeValues = new double[laneCapacity];
        VpeValues = new double[laneCapacity];
        Bins = new int[laneCapacity];
        Horizontal = new IntegrityDiagram(IntegrityDiagramAxis.Horizontal);
        Vertical = new IntegrityDiagram(IntegrityDiagramAxis.Vertical);
        Overbound = new OverboundHistogram[overboundGroups];
        for (int i = 0; i < overboundGroups; i++)
        {
            Overbound[i] = new OverboundHistogram();
        }
    }

    /// <summary>HPE and VPE of the block's trials (written by the sampler when integrity is on).</summary>
    public double[] HpeValues { get; }
    public double[] VpeValues { get; }

    /// <summary>Diagram error bins of the block's trials.</summary>
    public int[] Bins { get; }

    public IntegrityDiagram Horizontal { get; }
    public IntegrityDiagram Vertical { get; }

    /// <summary>Normalised range errors by (shell, elevation bin): see <see cref="IntegrityKernel.OverboundGroup"/>.</summary>
    public OverboundHistogram[] Overbound { get; }
}

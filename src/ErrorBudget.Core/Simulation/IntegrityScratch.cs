using ErrorBudget.Core.Integrity;

namespace ErrorBudget.Core.Simulation;

/// <summary>
/// Per-worker integrity buffers and the worker's share of the run-wide integrity diagrams and
/// overbounding histograms (merged once at the end: integer counts, so the result does not depend
/// on which worker saw what).
/// </summary>
internal sealed class IntegrityScratch
{
    public IntegrityScratch(int laneCapacity, int overboundGroups, int satellites = 0, Integrity.Araim.AraimSolver? araim = null)
    {
        Araim = araim;
        Flagged = new bool[laneCapacity];
        SatelliteNormals = araim is null ? [] : new double[satellites * laneCapacity];
        Ranges = new double[satellites];
        Sigma = new double[satellites];
        Constellation = new int[satellites];
        AccuracyVariance = new double[satellites];
        NominalBias = new double[satellites];
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

    /// <summary>ARAIM: this worker's solver, the per-satellite user-level normals [i * lanes + trial], one trial's ranges.</summary>
    public Integrity.Araim.AraimSolver? Araim { get; }
    public double[] SatelliteNormals { get; }
    public double[] Ranges { get; }

    /// <summary>ARAIM: each visible satellite's truth user-level sigma for the current (epoch, user).</summary>
    public double[] Sigma { get; }
    public int[] Constellation { get; }
    public double[] AccuracyVariance { get; }
    public double[] NominalBias { get; }

    /// <summary>Trials the receiver's monitor flagged without a successful exclusion (no service).</summary>
    public bool[] Flagged { get; }

    public IntegrityDiagram Horizontal { get; }
    public IntegrityDiagram Vertical { get; }

    /// <summary>Normalised range errors by (shell, elevation bin): see <see cref="IntegrityKernel.OverboundGroup"/>.</summary>
    public OverboundHistogram[] Overbound { get; }
}

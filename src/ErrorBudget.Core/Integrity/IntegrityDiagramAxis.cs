namespace ErrorBudget.Core.Integrity;

/// <summary>The position axis an <see cref="IntegrityDiagram"/> describes.</summary>
internal enum IntegrityDiagramAxis
{
    /// <summary>Horizontal: HPL against the horizontal position error.</summary>
    Horizontal = 0,

    /// <summary>Vertical: VPL against the vertical position error magnitude.</summary>
    Vertical = 1,
}

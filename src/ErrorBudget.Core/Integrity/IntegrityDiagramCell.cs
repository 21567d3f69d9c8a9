namespace ErrorBudget.Core.Integrity;

/// <summary>One non-empty cell of an <see cref="IntegrityDiagram"/>: bin indices as <see cref="IntegrityDiagram.BinOf"/> gives them.</summary>
/// <param name="PlBin">The protection-level bin.</param>
/// <param name="ErrorBin">The position-error bin.</param>
/// <param name="Count">The number of samples in the cell (&gt; 0).</param>
internal readonly record struct IntegrityDiagramCell(int PlBin, int ErrorBin, long Count);

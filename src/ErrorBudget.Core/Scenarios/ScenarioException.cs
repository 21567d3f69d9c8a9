namespace ErrorBudget.Core.Scenarios;

/// <summary>
/// A scenario could not be loaded. Carries every problem found at once; <see cref="Exception.Message"/>
/// is their messages joined by newlines, in line order.
/// </summary>
public sealed class ScenarioException : Exception
{
    public ScenarioException(IReadOnlyList<ScenarioError> errors, Exception? innerException = null)
        : base(JoinMessages(errors), innerException)
    {
        Errors = errors;
    }

    /// <summary>Every problem found, in line order (line 0, i.e. file-level problems, first).</summary>
    public IReadOnlyList<ScenarioError> Errors { get; }

    private static string JoinMessages(IReadOnlyList<ScenarioError> errors) =>
        errors.Count == 0 ? "The scenario is invalid." : string.Join('\n', errors.Select(e => e.Message));
}

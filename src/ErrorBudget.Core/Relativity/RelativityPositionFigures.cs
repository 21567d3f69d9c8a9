namespace ErrorBudget.Core.Relativity;

/// <summary>
/// Position error caused by the missed relativistic terms alone (all of them together, deterministic: no other
/// error), dx = S eps over sampled (user, epoch) pairs with a solution, S the weighted least-squares projection
/// with the assumed model's weights. A common range error on every satellite moves only the receiver clock, so
/// it leaves these at rounding level.
/// </summary>
/// <param name="UserEpochs">(user, epoch) pairs with a solution behind the figures.</param>
/// <param name="Hpe">Horizontal position error sqrt(dE^2 + dN^2), metres.</param>
/// <param name="Vpe">Vertical position error |dU|, metres.</param>
/// <param name="ReceiverClock">Receiver clock estimate error, metres of range: where a common error goes.</param>
public sealed record RelativityPositionFigures(long UserEpochs, ErrorStatistics Hpe, ErrorStatistics Vpe, ErrorStatistics ReceiverClock);

using FvGen.Ledger;

namespace FvGen.Time;

/// <summary>
/// The spatial discretisation of a finite-volume scheme: fills <paramref name="residual"/> with the
/// rate of change dU/dt per unit volume of every cell, and adds the flux leaving the domain
/// through each boundary patch to <paramref name="tally"/>.
/// </summary>
/// <remarks>
/// For a conservative residual, Σ residual · volume = −(sum of the tally's totals) to rounding; the
/// conservation ledger checks exactly that after every step. The caller clears the tally before
/// each evaluation. <paramref name="state"/> and <paramref name="residual"/> never overlap.
/// </remarks>
/// <typeparam name="TState">A conserved-state struct made only of <see cref="double"/> components.</typeparam>
/// <param name="state">The state of every cell at this stage.</param>
/// <param name="residual">Output: dU/dt per unit volume of every cell.</param>
/// <param name="time">The time of this stage.</param>
/// <param name="tally">Output: boundary flux · area leaving the domain, per patch and component.</param>
public delegate void ResidualFunction<TState>(ReadOnlySpan<TState> state, Span<TState> residual, double time, BoundaryFluxTally tally)
    where TState : unmanaged;

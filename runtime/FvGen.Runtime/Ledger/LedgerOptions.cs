namespace FvGen.Ledger;

/// <summary>When the conservation ledger stops a run.</summary>
public sealed record LedgerOptions
{
    /// <summary>
    /// The largest relative imbalance of one step tolerated before the run stops; rounding gives
    /// about 1e-16 per step. <see cref="double.PositiveInfinity"/> only reports and never stops.
    /// </summary>
    public double StepTolerance { get; init; } = 1e-10;

    /// <summary>The largest relative imbalance accumulated since the start of the run tolerated before the run stops.</summary>
    public double CumulativeTolerance { get; init; } = 1e-8;

    /// <summary>
    /// Components with a genuine volume source (reaction, gravity, a heat source), whose totals do not
    /// balance against the boundary alone: still reported, never a reason to stop.
    /// </summary>
    public IReadOnlyList<string> ExemptComponents { get; init; } = [];
}

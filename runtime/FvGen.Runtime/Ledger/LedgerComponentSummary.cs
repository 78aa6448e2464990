namespace FvGen.Ledger;

/// <summary>The balance of one conserved component over a run, in the units of Σ U·V.</summary>
/// <param name="Component">The component's name.</param>
/// <param name="InitialTotal">Σ U·V at the start.</param>
/// <param name="FinalTotal">Σ U·V now.</param>
/// <param name="Inflow">What entered through the boundary (sum of the inflowing parts, per patch and step), ≥ 0.</param>
/// <param name="Outflow">What left through the boundary (sum of the outflowing parts, per patch and step), ≥ 0.</param>
/// <param name="PatchOutflow">Net outflow through each patch, in patch order (negative for net inflow).</param>
/// <param name="Imbalance">(final − initial) + net outflow: zero up to rounding for a conservative scheme.</param>
/// <param name="RelativeImbalance">The imbalance relative to the ledger's scale.</param>
/// <param name="WorstStepRelativeImbalance">The largest relative imbalance of any one step.</param>
/// <param name="IsExempt">True when the component has a volume source and is not checked.</param>
public sealed record LedgerComponentSummary(
    string Component,
    double InitialTotal,
    double FinalTotal,
    double Inflow,
    double Outflow,
    IReadOnlyList<double> PatchOutflow,
    double Imbalance,
    double RelativeImbalance,
    double WorstStepRelativeImbalance,
    bool IsExempt);

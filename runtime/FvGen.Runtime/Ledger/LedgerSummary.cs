using System.Globalization;

namespace FvGen.Ledger;

/// <summary>A snapshot of the conservation ledger: the balance of every component after <see cref="StepCount"/> steps.</summary>
public sealed record LedgerSummary(int StepCount, double Time, IReadOnlyList<string> PatchNames, IReadOnlyList<LedgerComponentSummary> Components)
{
    /// <summary>Writes a short table, one block per component, in invariant culture.</summary>
    public void WriteTo(TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        var inv = CultureInfo.InvariantCulture;
        writer.WriteLine(string.Create(inv, $"Conservation ledger after {StepCount} steps, t = {Time:G10} (totals are sums of U·V):"));
        foreach (var c in Components)
        {
            writer.WriteLine(string.Create(inv, $"  {c.Component}{(c.IsExempt ? " (exempt: volume source)" : "")}"));
            writer.WriteLine(string.Create(inv, $"    total at start {c.InitialTotal,22:G12}   at end {c.FinalTotal,22:G12}"));
            writer.WriteLine(string.Create(inv, $"    boundary in    {c.Inflow,22:G12}   out    {c.Outflow,22:G12}"));
            for (int p = 0; p < PatchNames.Count; p++)
            {
                writer.WriteLine(string.Create(inv, $"      net outflow through '{PatchNames[p]}': {c.PatchOutflow[p]:G12}"));
            }

            writer.WriteLine(string.Create(
                inv,
                $"    imbalance {c.Imbalance:G3} (relative {c.RelativeImbalance:G3}; worst single step {c.WorstStepRelativeImbalance:G3})"));
        }
    }
}

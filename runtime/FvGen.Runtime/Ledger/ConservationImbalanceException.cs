using FvGen.Time;

namespace FvGen.Ledger;

/// <summary>The conservation ledger found a conserved total out of balance with the boundary fluxes beyond its tolerance.</summary>
public sealed class ConservationImbalanceException : RunStoppedException
{
    internal ConservationImbalanceException(string message, int step, double time, string component, double imbalance, double relativeImbalance, bool cumulative)
        : base(message, step, time)
    {
        Component = component;
        Imbalance = imbalance;
        RelativeImbalance = relativeImbalance;
        IsCumulative = cumulative;
    }

    /// <summary>The name of the component out of balance.</summary>
    public string Component { get; }

    /// <summary>Δ total + Σ Δt · weighted boundary outflow, in the units of the total.</summary>
    public double Imbalance { get; }

    /// <summary><see cref="Imbalance"/> divided by the ledger's scale (see the ledger's remarks).</summary>
    public double RelativeImbalance { get; }

    /// <summary>True when the imbalance accumulated since the start tripped the check; false for one step's.</summary>
    public bool IsCumulative { get; }
}

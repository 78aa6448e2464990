namespace FvGen.Ledger;

/// <summary>
/// The boundary flux totals of one residual evaluation: for every patch and conserved component,
/// the flux leaving the domain through that patch, Σ over its faces of flux · area (positive out).
/// </summary>
/// <remarks>
/// A generated residual adds into it in the same pass as its boundary loops; the time integrator
/// hands it to the conservation ledger with the stage's weight. Values are laid out
/// patch by patch: <c>Totals[patch * ComponentCount + component]</c>.
/// </remarks>
public sealed class BoundaryFluxTally
{
    private readonly double[] _totals;

    /// <summary>Creates a zero tally for <paramref name="patchCount"/> patches of <paramref name="componentCount"/> components.</summary>
    public BoundaryFluxTally(int patchCount, int componentCount)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(patchCount);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(componentCount);
        PatchCount = patchCount;
        ComponentCount = componentCount;
        _totals = new double[patchCount * componentCount];
    }

    /// <summary>Number of patches.</summary>
    public int PatchCount { get; }

    /// <summary>Number of conserved components.</summary>
    public int ComponentCount { get; }

    /// <summary>All totals, patch by patch.</summary>
    public Span<double> Totals => _totals;

    /// <summary>The totals of one patch, one per component.</summary>
    public Span<double> Patch(int patch) => _totals.AsSpan(patch * ComponentCount, ComponentCount);

    /// <summary>Adds <paramref name="flux"/> (flux · area, positive out) to the total of one patch and component.</summary>
    public void Add(int patch, int component, double flux) => _totals[patch * ComponentCount + component] += flux;

    /// <summary>Sets every total to zero; called before each residual evaluation.</summary>
    public void Clear() => Array.Clear(_totals);
}

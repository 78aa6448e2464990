namespace FvGen.Boundaries;

/// <summary>
/// A boundary binding does not match the patches of a mesh: some patch has no boundary flux, or
/// some bound name is not a patch of the mesh. The message names both lists and the mesh's patches.
/// </summary>
public sealed class BoundaryBindingException : InvalidOperationException
{
    /// <summary>Creates the exception from what was found wrong.</summary>
    public BoundaryBindingException(
        Type boundaryType,
        IReadOnlyList<string> meshPatches,
        IReadOnlyList<string> unboundPatches,
        IReadOnlyList<string> unknownPatches)
        : base(Describe(boundaryType, meshPatches, unboundPatches, unknownPatches))
    {
        UnboundPatches = unboundPatches;
        UnknownPatches = unknownPatches;
    }

    /// <summary>Patches of the mesh that no boundary flux is bound to.</summary>
    public IReadOnlyList<string> UnboundPatches { get; }

    /// <summary>Bound names that are not patches of the mesh.</summary>
    public IReadOnlyList<string> UnknownPatches { get; }

    private static string Describe(
        Type boundaryType,
        IReadOnlyList<string> meshPatches,
        IReadOnlyList<string> unboundPatches,
        IReadOnlyList<string> unknownPatches)
    {
        var parts = new List<string>();
        if (unboundPatches.Count > 0)
        {
            parts.Add($"no boundary flux is bound to patch(es) {Quote(unboundPatches)}");
        }

        if (unknownPatches.Count > 0)
        {
            parts.Add($"bound name(s) {Quote(unknownPatches)} are not patches of the mesh");
        }

        string patches = meshPatches.Count == 0 ? "none" : Quote(meshPatches);
        return $"Boundary binding of {boundaryType.Name}: {string.Join("; ", parts)}. "
            + $"The mesh's patches are: {patches}. Bind every patch once with Bind(name, {boundaryType.Name}.X) before the first step.";
    }

    private static string Quote(IEnumerable<string> names) => string.Join(", ", names.Select(n => $"'{n}'"));
}

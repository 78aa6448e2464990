using FvGen.Meshes;

namespace FvGen.Boundaries;

/// <summary>
/// Binds the boundary patches of a mesh, by name, to the boundary fluxes of a residual kernel.
/// </summary>
/// <typeparam name="TBoundary">
/// The enum the generator writes beside a residual kernel, with one member per method marked
/// <see cref="BoundaryFluxAttribute"/> in the kernel's type (for example <c>Physics.Boundary</c>).
/// </typeparam>
/// <remarks>
/// A generated residual asks for the flux of every patch once, before its face loops, and then
/// switches on it per patch, outside the face loop, calling the static boundary flux directly.
/// Resolving checks that every patch of the mesh is bound and that every bound name is a patch of
/// the mesh, and throws a <see cref="BoundaryBindingException"/> naming the offenders otherwise;
/// call <see cref="Validate"/> before the first time step to fail early. The resolved table is kept
/// per mesh, so repeated residual evaluations do not allocate.
/// </remarks>
public sealed class BoundaryBinding<TBoundary>
    where TBoundary : struct, Enum
{
    private readonly List<KeyValuePair<string, TBoundary>> _bindings = [];
    private Resolved? _last;

    /// <summary>Binds the patch called <paramref name="patchName"/> to <paramref name="flux"/>; returns this binding.</summary>
    /// <exception cref="ArgumentException">The name is empty, the flux is not a member of <typeparamref name="TBoundary"/>, or the patch is already bound.</exception>
    public BoundaryBinding<TBoundary> Bind(string patchName, TBoundary flux)
    {
        if (string.IsNullOrWhiteSpace(patchName))
        {
            throw new ArgumentException("A patch name must not be empty.", nameof(patchName));
        }

        if (!Enum.IsDefined(flux))
        {
            throw new ArgumentException($"{flux} is not a boundary flux of {typeof(TBoundary).FullName}.", nameof(flux));
        }

        foreach (var existing in _bindings)
        {
            if (existing.Key == patchName)
            {
                throw new ArgumentException(
                    $"Patch '{patchName}' is already bound to {existing.Value}; bind each patch once.", nameof(patchName));
            }
        }

        _bindings.Add(new(patchName, flux));
        _last = null;
        return this;
    }

    /// <summary>The patch names bound so far, in binding order.</summary>
    public IEnumerable<string> BoundPatches => _bindings.Select(b => b.Key);

    /// <summary>Checks that this binding covers exactly the patches of <paramref name="mesh"/>.</summary>
    /// <exception cref="BoundaryBindingException">A patch of the mesh is unbound, or a bound name is not a patch of the mesh.</exception>
    public void Validate(IMesh mesh) => Resolve(mesh);

    /// <summary>
    /// The boundary flux of every patch of <paramref name="mesh"/>, in patch-index order. Computed
    /// once per mesh; what generated residuals switch on.
    /// </summary>
    /// <exception cref="BoundaryBindingException">A patch of the mesh is unbound, or a bound name is not a patch of the mesh.</exception>
    public ReadOnlySpan<TBoundary> Resolve(IMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        var last = _last;
        if (last is not null && ReferenceEquals(last.Mesh, mesh))
        {
            return last.Fluxes;
        }

        var resolved = new Resolved(mesh, Build(mesh.PatchNames));
        _last = resolved;
        return resolved.Fluxes;
    }

    private TBoundary[] Build(IReadOnlyList<string> patchNames)
    {
        var fluxes = new TBoundary[patchNames.Count];
        var unbound = new List<string>();
        for (int p = 0; p < patchNames.Count; p++)
        {
            int found = _bindings.FindIndex(b => b.Key == patchNames[p]);
            if (found < 0)
            {
                unbound.Add(patchNames[p]);
                continue;
            }

            fluxes[p] = _bindings[found].Value;
        }

        var unknown = _bindings.Select(b => b.Key).Where(name => !patchNames.Contains(name)).ToList();
        if (unbound.Count > 0 || unknown.Count > 0)
        {
            throw new BoundaryBindingException(typeof(TBoundary), patchNames, unbound, unknown);
        }

        return fluxes;
    }

    private sealed record Resolved(IMesh Mesh, TBoundary[] Fluxes);
}

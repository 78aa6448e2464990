namespace FvGen;

/// <summary>
/// Marks a static method that computes the flux per unit area leaving the domain through a
/// boundary face.
/// </summary>
/// <remarks>
/// Expected signature: <c>static TState Name(in TState inside, in FaceGeometry face)</c>, where
/// <see cref="Geometry.FaceGeometry.Normal"/> points out of the domain. Patches of a mesh are bound to
/// boundary fluxes by name at run time; a patch left unbound is an error before the first step.
/// </remarks>
[AttributeUsage(AttributeTargets.Method, Inherited = false)]
public sealed class BoundaryFluxAttribute : Attribute
{
    /// <summary>Creates the attribute for a boundary of the given kind.</summary>
    public BoundaryFluxAttribute(BoundaryKind kind) => Kind = kind;

    /// <summary>The physical kind of this boundary.</summary>
    public BoundaryKind Kind { get; }
}

namespace FvGen.Generator.Fluxes;

/// <summary>
/// How to call one flux method: its name and the argument modifier (<c>"in "</c> or <c>""</c>) of
/// each parameter, so that the generated call matches the signature the user wrote.
/// </summary>
internal sealed record FluxCall(string Name, string StateModifier, string FaceModifier);

/// <summary>One boundary flux of a kernel's type: how to call it and its declared kind (a <c>BoundaryKind</c> member name).</summary>
internal sealed record BoundaryFluxEntry(FluxCall Call, string Kind);

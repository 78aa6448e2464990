namespace FvGen.Generator.Fluxes;

/// <summary>
/// How to call one flux method: its name and the argument modifier (<c>"in "</c> or <c>""</c>) of
/// each parameter, so that the generated call matches the signature the user wrote.
/// </summary>
/// <param name="Name">The flux method.</param>
/// <param name="StateModifier">Modifier of the state parameter(s).</param>
/// <param name="FaceModifier">Modifier of the face parameter.</param>
/// <param name="GradientModifier">The modifier of the two gradient parameters of a diffusion flux, or null when the flux takes no gradients.</param>
/// <param name="WidthModifier">The modifier of the four cell widths of a width-aware structured user reconstruction, or null for its geometry-free form.</param>
internal sealed record FluxCall(string Name, string StateModifier, string FaceModifier, string? GradientModifier = null, string? WidthModifier = null)
{
    /// <summary>True for a flux that takes the two cells' gradients after the face (a diffusion flux).</summary>
    public bool TakesGradients => GradientModifier is not null;
}

/// <summary>One boundary flux of a kernel's type: how to call it and its declared kind (a <c>BoundaryKind</c> member name).</summary>
internal sealed record BoundaryFluxEntry(FluxCall Call, string Kind);

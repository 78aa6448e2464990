namespace FvGen.Generator;

/// <summary>Names of the generator's tracked incremental steps, for tests and diagnostics of caching.</summary>
public static class TrackingNames
{
    /// <summary>Conserved-state structs parsed into models.</summary>
    public const string States = "FvGen.States";

    /// <summary>Boundary fluxes found, one per method.</summary>
    public const string BoundaryFluxes = "FvGen.BoundaryFluxes";

    /// <summary>Boundary fluxes grouped by type, one set per <c>Boundary</c> enum.</summary>
    public const string BoundarySets = "FvGen.BoundarySets";

    /// <summary>Residual kernels parsed into models.</summary>
    public const string Kernels = "FvGen.Kernels";
}

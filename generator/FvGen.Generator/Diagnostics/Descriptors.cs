using Microsoft.CodeAnalysis;

namespace FvGen.Generator.Diagnostics;

/// <summary>The descriptors of the generator's diagnostics. The help link of each is derived from its ID.</summary>
internal static class Descriptors
{
    private const string Category = "FvGen.Generator";
    private const string HelpBase = "https://fvgen.invalid/docs/rules/";

    public static readonly DiagnosticDescriptor StateNotPartialStruct = Create(
        DiagnosticIds.StateNotPartialStruct,
        "Conserved state must be a partial struct",
        "'{0}' is marked [ConservedState] but is not a partial struct (and every type around it partial); no state members are generated");

    public static readonly DiagnosticDescriptor StateComponentNotDouble = Create(
        DiagnosticIds.StateComponentNotDouble,
        "Conserved state component must be a mutable double field",
        "Component '{0}' of conserved state '{1}' {2}; a conserved state holds only accessible, non-readonly double fields, directly or in nested structs of such fields");

    public static readonly DiagnosticDescriptor NumericalFluxSignature = Create(
        DiagnosticIds.NumericalFluxSignature,
        "Numerical flux has the wrong signature",
        "Numerical flux '{0}' must be 'static TState {0}(in TState left, in TState right, in FaceGeometry face)' with TState a [ConservedState] struct: {1}");

    public static readonly DiagnosticDescriptor BoundaryFluxSignature = Create(
        DiagnosticIds.BoundaryFluxSignature,
        "Boundary flux has the wrong signature",
        "Boundary flux '{0}' must be 'static TState {0}(in TState inside, in FaceGeometry face)' with TState a [ConservedState] struct: {1}");

    public static readonly DiagnosticDescriptor KernelNotStaticPartialVoid = Create(
        DiagnosticIds.KernelNotStaticPartialVoid,
        "Residual kernel must be a static partial void method without a body",
        "Residual kernel '{0}' must be declared 'static partial void' with no body of its own: {1}");

    public static readonly DiagnosticDescriptor KernelParameters = Create(
        DiagnosticIds.KernelParameters,
        "Residual kernel parameters match no mesh kind",
        "Residual kernel '{0}': {1}");

    public static readonly DiagnosticDescriptor KernelFluxNotFound = Create(
        DiagnosticIds.KernelFluxNotFound,
        "Residual kernel names no numerical flux of its type",
        "Residual kernel '{0}' names numerical flux '{1}', but '{2}' has no static method of that name marked [NumericalFlux]");

    public static readonly DiagnosticDescriptor ReconstructionNotAvailable = Create(
        DiagnosticIds.ReconstructionNotAvailable,
        "Reconstruction or limiter not available",
        "Residual kernel '{0}': {1}");

    public static readonly DiagnosticDescriptor BoundaryKindUnknown = Create(
        DiagnosticIds.BoundaryKindUnknown,
        "Boundary kind does not exist",
        "Boundary flux '{0}' declares boundary kind {1}, which is not a member of FvGen.BoundaryKind");

    public static readonly DiagnosticDescriptor FluxStateMismatch = Create(
        DiagnosticIds.FluxStateMismatch,
        "Flux and kernel disagree on the conserved state",
        "Residual kernel '{0}' works on '{1}', but its {2} '{3}' works on '{4}'; a flux can serve only kernels of its own state");

    public static readonly DiagnosticDescriptor ModeNotAvailable = Create(
        DiagnosticIds.ModeNotAvailable,
        "Execution mode not available for these parameters",
        "Residual kernel '{0}': {1}");

    public static readonly DiagnosticDescriptor ContainingTypeNotPartial = Create(
        DiagnosticIds.ContainingTypeNotPartial,
        "Residual kernel must live in partial types",
        "Residual kernel '{0}' is in type '{1}', which is not declared partial; the generator cannot add the kernel body or the Boundary enum");

    public static readonly DiagnosticDescriptor BoundaryNameTaken = Create(
        DiagnosticIds.BoundaryNameTaken,
        "The name Boundary is taken in a type with boundary fluxes",
        "'{0}' declares boundary fluxes, so the generator adds a nested enum 'Boundary' to it, but the type already has a member named 'Boundary'; rename that member");

    public static readonly DiagnosticDescriptor[] All =
    {
        StateNotPartialStruct, StateComponentNotDouble, NumericalFluxSignature, BoundaryFluxSignature,
        KernelNotStaticPartialVoid, KernelParameters, KernelFluxNotFound, ReconstructionNotAvailable,
        BoundaryKindUnknown, FluxStateMismatch, ModeNotAvailable, ContainingTypeNotPartial, BoundaryNameTaken,
    };

    private static DiagnosticDescriptor Create(string id, string title, string message) =>
        new(id, title, message, Category, DiagnosticSeverity.Error, isEnabledByDefault: true, helpLinkUri: HelpBase + id + ".md");
}

using FvGen.Generator.Common;
using FvGen.Generator.Fluxes;
using FvGen.Generator.States;

namespace FvGen.Generator.Kernels;

/// <summary>
/// Everything the emitter needs to write one residual kernel. Like every generator model it holds
/// only strings, numbers, enums and equatable arrays — never an <c>ISymbol</c>, <c>SyntaxNode</c>,
/// <c>Location</c>, <c>Compilation</c> or <c>Diagnostic</c> — so equal declarations give equal models
/// and the incremental pipeline skips unchanged kernels. Flux bodies are not part of it: editing a
/// flux body changes no kernel text.
/// </summary>
/// <param name="Location">Namespace and containing types of the kernel (the kernel's own type innermost).</param>
/// <param name="TypeName">The <c>global::</c>-qualified name of the kernel's type, which holds the fluxes.</param>
/// <param name="MethodName">The kernel method.</param>
/// <param name="Modifiers">The declaration's modifiers as written, e.g. <c>public static partial</c>.</param>
/// <param name="Mesh">The mesh kind the parameters name.</param>
/// <param name="State">The conserved state, with its components.</param>
/// <param name="Parameters">The kernel's parameters in declaration order, each with its role.</param>
/// <param name="Flux">The numerical flux call.</param>
/// <param name="BoundaryFluxes">The boundary fluxes of the kernel's type, in <c>Boundary</c> enum order.</param>
/// <param name="Mode">How the loops run.</param>
/// <param name="Reconstruction">How face states are obtained.</param>
/// <param name="Limiter">The limiter of a linear reconstruction.</param>
/// <param name="UserReconstruction">The user reconstruction to call when <paramref name="Reconstruction"/> is <c>User</c>.</param>
/// <param name="RuntimeModes">When the kernel takes an <c>ExecutionMode</c> parameter: the modes its parameters support, chosen at run time; otherwise empty.</param>
internal sealed record ResidualKernelModel(
    TypeLocation Location,
    string TypeName,
    string MethodName,
    string Modifiers,
    MeshKind Mesh,
    ConservedStateModel State,
    EquatableArray<KernelParameter> Parameters,
    FluxCall Flux,
    EquatableArray<BoundaryFluxEntry> BoundaryFluxes,
    KernelMode Mode,
    KernelReconstruction Reconstruction,
    KernelLimiter Limiter,
    FluxCall? UserReconstruction = null,
    EquatableArray<KernelMode> RuntimeModes = default)
{
    /// <summary>
    /// True when the kernel computes Green–Gauss cell gradients first: for a flux that takes gradients
    /// (any mesh), or for linear or user reconstruction on an unstructured mesh.
    /// </summary>
    public bool NeedsGradients => Flux.TakesGradients || (Mesh == MeshKind.Unstructured && Reconstruction != KernelReconstruction.FirstOrder);
}

/// <summary>One parameter of a kernel.</summary>
/// <param name="Name">The name as declared.</param>
/// <param name="Role">What the generated code uses it for.</param>
/// <param name="TypeText">The parameter type as written into the generated signature (<c>global::</c>-qualified, nullable annotation kept).</param>
/// <param name="IsMemory">True for <c>Memory</c>/<c>ReadOnlyMemory</c> containers, false for spans.</param>
/// <param name="Prefix">A modifier such as <c>scoped </c>, or empty.</param>
internal sealed record KernelParameter(string Name, ParameterRole Role, string TypeText, bool IsMemory, string Prefix);

/// <summary>The mesh kinds a kernel can be written for.</summary>
internal enum MeshKind
{
    Structured1D = 1,
    Structured2D = 2,
    Structured3D = 3,
    Unstructured = 4,
}

/// <summary>What a kernel parameter is for.</summary>
internal enum ParameterRole
{
    Mesh,
    State,
    Residual,
    Boundaries,
    Tally,
    ParallelOptions,
    FaceBuffer,
    GradientBuffer,
    Mode,
}

/// <summary>Mirror of <c>FvGen.ExecutionMode</c> (same values).</summary>
internal enum KernelMode
{
    SerialScatter = 0,
    ParallelGather = 1,
    ParallelColouredScatter = 2,
}

/// <summary>Mirror of <c>FvGen.ReconstructionKind</c> (same values).</summary>
internal enum KernelReconstruction
{
    FirstOrder = 0,
    Linear = 1,
    User = 2,
}

/// <summary>Mirror of <c>FvGen.LimiterKind</c> (same values).</summary>
internal enum KernelLimiter
{
    Minmod = 0,
    VanLeer = 1,
    MonotonizedCentral = 2,
    Superbee = 3,
    BarthJespersen = 4,
}

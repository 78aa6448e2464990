namespace FvGen.Generator.Diagnostics;

/// <summary>The IDs of the generator's diagnostics; each has a page <c>docs/rules/&lt;ID&gt;.md</c>.</summary>
internal static class DiagnosticIds
{
    public const string StateNotPartialStruct = "FVG0001";
    public const string StateComponentNotDouble = "FVG0002";
    public const string NumericalFluxSignature = "FVG0003";
    public const string BoundaryFluxSignature = "FVG0004";
    public const string KernelNotStaticPartialVoid = "FVG0005";
    public const string KernelParameters = "FVG0006";
    public const string KernelFluxNotFound = "FVG0007";
    public const string ReconstructionNotAvailable = "FVG0008";
    public const string BoundaryKindUnknown = "FVG0009";
    public const string FluxStateMismatch = "FVG0010";
    public const string ModeNotAvailable = "FVG0011";
    public const string ContainingTypeNotPartial = "FVG0012";
    public const string BoundaryNameTaken = "FVG0013";
}

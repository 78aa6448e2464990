namespace FvGen.Generator.Common;

/// <summary>Metadata and source names of the runtime types the generator recognises.</summary>
internal static class KnownNames
{
    public const string ConservedStateAttribute = "FvGen.ConservedStateAttribute";
    public const string NumericalFluxAttribute = "FvGen.NumericalFluxAttribute";
    public const string BoundaryFluxAttribute = "FvGen.BoundaryFluxAttribute";
    public const string ResidualKernelAttribute = "FvGen.ResidualKernelAttribute";
    public const string FaceDataAttribute = "FvGen.FaceDataAttribute";
    public const string FaceGeometry = "FvGen.Geometry.FaceGeometry";
    public const string Vec3 = "FvGen.Geometry.Vec3";
    public const string GradientOpen = "FvGen.Geometry.Gradient<TState>";
    public const string StructuredGrid1D = "FvGen.Meshes.Structured.StructuredGrid1D";
    public const string StructuredGrid2D = "FvGen.Meshes.Structured.StructuredGrid2D";
    public const string StructuredGrid3D = "FvGen.Meshes.Structured.StructuredGrid3D";
    public const string UnstructuredMesh = "FvGen.Meshes.Unstructured.UnstructuredMesh";
    public const string BoundaryBinding = "FvGen.Boundaries.BoundaryBinding`1";
    public const string BoundaryFluxTally = "FvGen.Ledger.BoundaryFluxTally";
    public const string ParallelOptions = "System.Threading.Tasks.ParallelOptions";
    public const string ExecutionMode = "FvGen.ExecutionMode";

    /// <summary>The name of the enum written beside the boundary fluxes of a type.</summary>
    public const string BoundaryEnumName = "Boundary";
}

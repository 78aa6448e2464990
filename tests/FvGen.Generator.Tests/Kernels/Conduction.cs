using FvGen;
using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Structured;
using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Kernels;

/// <summary>Heat conduction T_t = ∇·(k ∇T) with a flux that takes the two cells' gradients.</summary>
public static partial class Conduction
{
    public const double Conductivity = 0.8;

    /// <summary>The temperature held on fixed-temperature patches.</summary>
    public const double WallTemperature = 2.0;

    /// <summary>Fourier's law with the mean of the two Green–Gauss cell gradients: F·n = -k ḡ·n (common practice).</summary>
    [NumericalFlux(Antisymmetric = true)]
    public static Scalar Fourier(in Scalar left, in Scalar right, in FaceGeometry face, in Gradient<Scalar> leftGradient, in Gradient<Scalar> rightGradient)
    {
        double gx = 0.5 * (leftGradient.X.Value + rightGradient.X.Value);
        double gy = 0.5 * (leftGradient.Y.Value + rightGradient.Y.Value);
        double gz = 0.5 * (leftGradient.Z.Value + rightGradient.Z.Value);
        return new Scalar(-Conductivity * (gx * face.Normal.X + gy * face.Normal.Y + gz * face.Normal.Z));
    }

    /// <summary>Fixed temperature: two-point difference over the centre-to-face distance.</summary>
    [BoundaryFlux(BoundaryKind.UserDefined)]
    public static Scalar FixedTemperature(in Scalar inside, in FaceGeometry face) =>
        new(-Conductivity * (WallTemperature - inside.Value) / face.CentreDistance);

    [BoundaryFlux(BoundaryKind.Wall)]
    public static Scalar Insulated(in Scalar inside, in FaceGeometry face) => default;

    [ResidualKernel(nameof(Fourier))]
    public static partial void Serial(UnstructuredMesh mesh, ReadOnlySpan<Scalar> temperature, Span<Scalar> rate, Span<Gradient<Scalar>> gradients, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Fourier))]
    public static partial void Grid2D(StructuredGrid2D grid, ReadOnlySpan<Scalar> temperature, Span<Scalar> rate, Span<Gradient<Scalar>> gradients, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Fourier), Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void GridSlabs3D(
        StructuredGrid3D grid, ReadOnlyMemory<Scalar> temperature, Memory<Scalar> rate, Memory<Gradient<Scalar>> gradients, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Fourier))]
    public static partial void Grid3D(StructuredGrid3D grid, ReadOnlySpan<Scalar> temperature, Span<Scalar> rate, Span<Gradient<Scalar>> gradients, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Fourier), Mode = ExecutionMode.ParallelGather)]
    public static partial void GridGather3D(
        StructuredGrid3D grid,
        ReadOnlyMemory<Scalar> temperature,
        Memory<Scalar> rate,
        Memory<Gradient<Scalar>> gradients,
        [FaceData] Memory<Scalar> faceFlux,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options);

    [ResidualKernel(nameof(Fourier), Mode = ExecutionMode.ParallelGather)]
    public static partial void Gather(
        UnstructuredMesh mesh,
        ReadOnlyMemory<Scalar> temperature,
        Memory<Scalar> rate,
        Memory<Gradient<Scalar>> gradients,
        [FaceData] Memory<Scalar> faceFlux,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options);
}

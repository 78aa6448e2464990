using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Meshes.Structured;
using FvGen.Meshes.Unstructured;

namespace FvGen.Benchmarks;

/// <summary>Horizontal discharge of <see cref="Water"/>.</summary>
public struct Discharge
{
    public double X;
    public double Y;
}

/// <summary>Shallow-water state: depth and discharge.</summary>
[ConservedState]
public partial struct Water
{
    public double Depth;
    public Discharge Flow;
}

/// <summary>Shallow water with a Rusanov flux: the physics both the generated and the hand-written residuals call.</summary>
/// <remarks>
/// The generator tests have their own shallow-water kernel type (tests/FvGen.Generator.Tests/Kernels/ShallowWater.cs)
/// on purpose: the benchmark must not depend on the test project, its flux is written component by component
/// because it is the measured hot path, while the tests' flux uses the generated state operators to exercise them.
/// </remarks>
public static partial class ShallowWaterPhysics
{
    public const double Gravity = 9.81;

    public static Water Physical(in Water u, in Vec3 n, out double speed)
    {
        double vx = u.Flow.X / u.Depth, vy = u.Flow.Y / u.Depth;
        double vn = vx * n.X + vy * n.Y;
        double pressure = 0.5 * Gravity * u.Depth * u.Depth;
        speed = Math.Abs(vn) + Math.Sqrt(Gravity * u.Depth);
        Water f;
        f.Depth = u.Depth * vn;
        f.Flow.X = u.Flow.X * vn + pressure * n.X;
        f.Flow.Y = u.Flow.Y * vn + pressure * n.Y;
        return f;
    }

    [NumericalFlux(Antisymmetric = true)]
    public static Water Rusanov(in Water left, in Water right, in FaceGeometry face)
    {
        var fl = Physical(left, face.Normal, out double sl);
        var fr = Physical(right, face.Normal, out double sr);
        double s = Math.Max(sl, sr);
        Water f;
        f.Depth = 0.5 * (fl.Depth + fr.Depth) - 0.5 * s * (right.Depth - left.Depth);
        f.Flow.X = 0.5 * (fl.Flow.X + fr.Flow.X) - 0.5 * s * (right.Flow.X - left.Flow.X);
        f.Flow.Y = 0.5 * (fl.Flow.Y + fr.Flow.Y) - 0.5 * s * (right.Flow.Y - left.Flow.Y);
        return f;
    }

    [BoundaryFlux(BoundaryKind.Wall)]
    public static Water Wall(in Water inside, in FaceGeometry face)
    {
        double pressure = 0.5 * Gravity * inside.Depth * inside.Depth;
        Water f;
        f.Depth = 0.0;
        f.Flow.X = pressure * face.Normal.X;
        f.Flow.Y = pressure * face.Normal.Y;
        return f;
    }

    [ResidualKernel(nameof(Rusanov))]
    public static partial void Structured(StructuredGrid2D grid, ReadOnlySpan<Water> state, Span<Water> residual, BoundaryBinding<Boundary> boundaries);

    [ResidualKernel(nameof(Rusanov))]
    public static partial void Unstructured(UnstructuredMesh mesh, ReadOnlySpan<Water> state, Span<Water> residual, BoundaryBinding<Boundary> boundaries);

    [ResidualKernel(nameof(Rusanov), Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void StructuredSlabs(StructuredGrid2D grid, ReadOnlyMemory<Water> state, Memory<Water> residual, BoundaryBinding<Boundary> boundaries, ParallelOptions options);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.VanLeer)]
    public static partial void Muscl1D(StructuredGrid1D grid, ReadOnlySpan<Water> state, Span<Water> residual);

    [ResidualKernel(nameof(Rusanov), Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void UnstructuredColoured(UnstructuredMesh mesh, ReadOnlyMemory<Water> state, Memory<Water> residual, BoundaryBinding<Boundary> boundaries, ParallelOptions options);

    [ResidualKernel(nameof(Rusanov), Mode = ExecutionMode.ParallelGather)]
    public static partial void UnstructuredGather(
        UnstructuredMesh mesh, ReadOnlyMemory<Water> state, Memory<Water> residual, [FaceData] Memory<Water> faceFlux, BoundaryBinding<Boundary> boundaries, ParallelOptions options);

    [ResidualKernel(nameof(Rusanov))]
    public static partial void Structured3D(StructuredGrid3D grid, ReadOnlySpan<Water> state, Span<Water> residual, BoundaryBinding<Boundary> boundaries);

    [ResidualKernel(nameof(Rusanov), Mode = ExecutionMode.ParallelGather)]
    public static partial void StructuredGather(
        StructuredGrid2D grid, ReadOnlyMemory<Water> state, Memory<Water> residual, [FaceData] Memory<Water> faceFlux, BoundaryBinding<Boundary> boundaries, ParallelOptions options);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear)]
    public static partial void UnstructuredLinear(
        UnstructuredMesh mesh, ReadOnlySpan<Water> state, Span<Water> residual, Span<Gradient<Water>> gradients, BoundaryBinding<Boundary> boundaries);
}

/// <summary>
/// Smoothing of depth and discharge by a diffusion flux that takes the two cells' gradients: the
/// physics of the gradient-taking pair (benchmark physics, not a validated model).
/// </summary>
public static partial class Smoothing
{
    public const double Diffusivity = 0.01;

    /// <summary>−κ times the mean of the two cells' gradients along the normal, per component.</summary>
    [NumericalFlux(Antisymmetric = true)]
    public static Water MeanGradient(in Water left, in Water right, in FaceGeometry face, in Gradient<Water> leftGradient, in Gradient<Water> rightGradient)
    {
        Vec3 n = face.Normal;
        double k = -0.5 * Diffusivity;
        Water f;
        f.Depth = k * ((leftGradient.X.Depth + rightGradient.X.Depth) * n.X + (leftGradient.Y.Depth + rightGradient.Y.Depth) * n.Y + (leftGradient.Z.Depth + rightGradient.Z.Depth) * n.Z);
        f.Flow.X = k * ((leftGradient.X.Flow.X + rightGradient.X.Flow.X) * n.X + (leftGradient.Y.Flow.X + rightGradient.Y.Flow.X) * n.Y + (leftGradient.Z.Flow.X + rightGradient.Z.Flow.X) * n.Z);
        f.Flow.Y = k * ((leftGradient.X.Flow.Y + rightGradient.X.Flow.Y) * n.X + (leftGradient.Y.Flow.Y + rightGradient.Y.Flow.Y) * n.Y + (leftGradient.Z.Flow.Y + rightGradient.Z.Flow.Y) * n.Z);
        return f;
    }

    /// <summary>Nothing diffuses through the boundary.</summary>
    [BoundaryFlux(BoundaryKind.Wall)]
    public static Water Insulated(in Water inside, in FaceGeometry face) => default;

    [ResidualKernel(nameof(MeanGradient))]
    public static partial void Unstructured(
        UnstructuredMesh mesh, ReadOnlySpan<Water> state, Span<Water> residual, Span<Gradient<Water>> gradients, BoundaryBinding<Boundary> boundaries);
}

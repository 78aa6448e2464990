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
}

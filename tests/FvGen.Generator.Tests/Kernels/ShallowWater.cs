using FvGen;
using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Structured;
using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Kernels;

/// <summary>A horizontal vector, a nested component group of <see cref="WaterState"/>.</summary>
public struct Horizontal
{
    public double X;
    public double Y;
}

/// <summary>Shallow-water state: depth h and discharge (hu, hv) — a nested group flattened to "Discharge.X", "Discharge.Y".</summary>
[ConservedState]
public partial struct WaterState
{
    public double Depth;
    public Horizontal Discharge;
}

/// <summary>Shallow-water equations with a Rusanov (local Lax–Friedrichs) flux; a nonlinear system for conservation tests.</summary>
public static partial class ShallowWater
{
    public const double Gravity = 9.81;

    /// <summary>Physical flux F(U)·n of the shallow-water equations.</summary>
    public static WaterState Physical(in WaterState u, Vec3 n, out double waveSpeed)
    {
        double h = u.Depth;
        double vx = u.Discharge.X / h;
        double vy = u.Discharge.Y / h;
        double vn = vx * n.X + vy * n.Y;
        double pressure = 0.5 * Gravity * h * h;
        waveSpeed = Math.Abs(vn) + Math.Sqrt(Gravity * h);
        WaterState f;
        f.Depth = h * vn;
        f.Discharge.X = u.Discharge.X * vn + pressure * n.X;
        f.Discharge.Y = u.Discharge.Y * vn + pressure * n.Y;
        return f;
    }

    /// <summary>Rusanov flux: central flux minus half the largest local wave speed times the jump (REFERENCES.md).</summary>
    [NumericalFlux(Antisymmetric = true)]
    public static WaterState Rusanov(in WaterState left, in WaterState right, in FaceGeometry face)
    {
        var fl = Physical(left, face.Normal, out double sl);
        var fr = Physical(right, face.Normal, out double sr);
        double s = Math.Max(sl, sr);
        return 0.5 * (fl + fr) - 0.5 * s * (right - left);
    }

    /// <summary>Reflecting wall: only the hydrostatic pressure acts.</summary>
    [BoundaryFlux(BoundaryKind.Wall)]
    public static WaterState Wall(in WaterState inside, in FaceGeometry face)
    {
        double pressure = 0.5 * Gravity * inside.Depth * inside.Depth;
        WaterState f;
        f.Depth = 0.0;
        f.Discharge.X = pressure * face.Normal.X;
        f.Discharge.Y = pressure * face.Normal.Y;
        return f;
    }

    /// <summary>Transmissive outflow: the physical flux of the inside state.</summary>
    [BoundaryFlux(BoundaryKind.Outflow)]
    public static WaterState Outflow(in WaterState inside, in FaceGeometry face) => Physical(inside, face.Normal, out _);

    [ResidualKernel(nameof(Rusanov))]
    public static partial void Residual2D(StructuredGrid2D grid, ReadOnlySpan<WaterState> state, Span<WaterState> residual, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.MonotonizedCentral)]
    public static partial void Muscl2D(StructuredGrid2D grid, ReadOnlySpan<WaterState> state, Span<WaterState> residual, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.MonotonizedCentral, Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void MusclSlabs2D(
        StructuredGrid2D grid, ReadOnlyMemory<WaterState> state, Memory<WaterState> residual, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.MonotonizedCentral, Mode = ExecutionMode.ParallelGather)]
    public static partial void MusclGather2D(
        StructuredGrid2D grid,
        ReadOnlyMemory<WaterState> state,
        Memory<WaterState> residual,
        [FaceData] Memory<WaterState> faceFlux,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options);

    [ResidualKernel(nameof(Rusanov))]
    public static partial void Serial(UnstructuredMesh mesh, ReadOnlySpan<WaterState> state, Span<WaterState> residual, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Rusanov), Mode = ExecutionMode.ParallelGather)]
    public static partial void Gather(
        UnstructuredMesh mesh,
        ReadOnlyMemory<WaterState> state,
        Memory<WaterState> residual,
        [FaceData] Memory<WaterState> faceFlux,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear)]
    public static partial void LinearSerial(
        UnstructuredMesh mesh, ReadOnlySpan<WaterState> state, Span<WaterState> residual, Span<Gradient<WaterState>> gradients, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.BarthJespersen, Mode = ExecutionMode.ParallelGather)]
    public static partial void LinearGather(
        UnstructuredMesh mesh,
        ReadOnlyMemory<WaterState> state,
        Memory<WaterState> residual,
        Memory<Gradient<WaterState>> gradients,
        [FaceData] Memory<WaterState> faceFlux,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options);

    /// <summary>A user reconstruction equal to the built-in one: the cell value extrapolated to the face with its gradient.</summary>
    public static void ExtrapolateWithGradient(in WaterState cell, in Gradient<WaterState> gradient, in Vec3 toFace, out WaterState faceState) =>
        faceState = cell + (toFace.X * gradient.X + toFace.Y * gradient.Y + toFace.Z * gradient.Z);

    /// <summary>A first-order user reconstruction: every face sees the cell average (arguments by value, to cover that form).</summary>
    public static void CellAverage(WaterState cell, Gradient<WaterState> gradient, Vec3 toFace, out WaterState faceState) => faceState = cell;

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(ExtrapolateWithGradient))]
    public static partial void UserLinearSerial(
        UnstructuredMesh mesh, ReadOnlySpan<WaterState> state, Span<WaterState> residual, Span<Gradient<WaterState>> gradients, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(CellAverage))]
    public static partial void UserFirstOrderSerial(
        UnstructuredMesh mesh, ReadOnlySpan<WaterState> state, Span<WaterState> residual, Span<Gradient<WaterState>> gradients, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(ExtrapolateWithGradient), Mode = ExecutionMode.ParallelGather)]
    public static partial void UserLinearGather(
        UnstructuredMesh mesh,
        ReadOnlyMemory<WaterState> state,
        Memory<WaterState> residual,
        Memory<Gradient<WaterState>> gradients,
        [FaceData] Memory<WaterState> faceFlux,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options);

    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear, Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void LinearColoured(
        UnstructuredMesh mesh,
        ReadOnlyMemory<WaterState> state,
        Memory<WaterState> residual,
        Memory<Gradient<WaterState>> gradients,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options);

    /// <summary>The mode chosen by the caller at run time.</summary>
    [ResidualKernel(nameof(Rusanov))]
    public static partial void AnyMode(
        UnstructuredMesh mesh,
        ReadOnlyMemory<WaterState> state,
        Memory<WaterState> residual,
        [FaceData] Memory<WaterState> faceFlux,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options,
        ExecutionMode mode);

    /// <summary>MUSCL on a 2-D grid, the mode chosen by the caller at run time (all three are available).</summary>
    [ResidualKernel(nameof(Rusanov), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.MonotonizedCentral)]
    public static partial void MusclAnyMode2D(
        StructuredGrid2D grid,
        ReadOnlyMemory<WaterState> state,
        Memory<WaterState> residual,
        [FaceData] Memory<WaterState> faceFlux,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options,
        ExecutionMode mode);

    [ResidualKernel(nameof(Rusanov))]
    public static partial void AnyMode1D(StructuredGrid1D grid, ReadOnlySpan<WaterState> state, Span<WaterState> residual, BoundaryBinding<Boundary> boundaries, ExecutionMode mode);

    [ResidualKernel(nameof(Rusanov), Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void Coloured(
        UnstructuredMesh mesh,
        ReadOnlyMemory<WaterState> state,
        Memory<WaterState> residual,
        BoundaryBinding<Boundary> boundaries,
        BoundaryFluxTally? tally,
        ParallelOptions options);
}

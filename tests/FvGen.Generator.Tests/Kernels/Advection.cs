using FvGen;
using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Structured;
using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Kernels;

/// <summary>Linear advection u_t + ∇·(a u) = 0 with a constant velocity a, upwind fluxes.</summary>
public static partial class Advection
{
    /// <summary>The advection velocity.</summary>
    public static readonly Vec3 Velocity = new(1.0, 0.5, 0.25);

    /// <summary>The value carried in through inflow patches.</summary>
    public const double InflowValue = 0.75;

    /// <summary>Upwind flux: a·n times the upwind state (common practice; LeVeque 2002, ch. 4).</summary>
    [NumericalFlux(Antisymmetric = true)]
    public static Scalar Upwind(in Scalar left, in Scalar right, in FaceGeometry face)
    {
        double an = Vec3.Dot(Velocity, face.Normal);
        return new Scalar(an * (an >= 0 ? left.Value : right.Value));
    }

    /// <summary>Upwind boundary: the inside state leaves, the fixed inflow value enters.</summary>
    [BoundaryFlux(BoundaryKind.Inflow)]
    public static Scalar Open(in Scalar inside, in FaceGeometry face)
    {
        double an = Vec3.Dot(Velocity, face.Normal);
        return new Scalar(an * (an >= 0 ? inside.Value : InflowValue));
    }

    /// <summary>No flux through a wall.</summary>
    [BoundaryFlux(BoundaryKind.Wall)]
    public static Scalar Wall(in Scalar inside, in FaceGeometry face) => default;

    [ResidualKernel(nameof(Upwind))]
    public static partial void Residual1D(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind))]
    public static partial void Residual2D(StructuredGrid2D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind))]
    public static partial void Residual3D(StructuredGrid3D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void Slabs3D(StructuredGrid3D grid, ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelGather)]
    public static partial void Gather1D(
        StructuredGrid1D grid, ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, [FaceData] Memory<Scalar> faceFlux, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelGather)]
    public static partial void Gather2D(
        StructuredGrid2D grid, ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, [FaceData] Memory<Scalar> faceFlux, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelGather)]
    public static partial void Gather3D(
        StructuredGrid3D grid, ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, [FaceData] Memory<Scalar> faceFlux, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.VanLeer, Mode = ExecutionMode.ParallelGather)]
    public static partial void MusclGather3D(
        StructuredGrid3D grid, ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, [FaceData] Memory<Scalar> faceFlux, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Upwind))]
    public static partial void ResidualUnstructured(UnstructuredMesh mesh, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.Minmod)]
    public static partial void MusclMinmod1D(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.VanLeer)]
    public static partial void MusclVanLeer1D(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.MonotonizedCentral)]
    public static partial void MusclMC1D(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.Superbee)]
    public static partial void MusclSuperbee1D(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    /// <summary>
    /// Fromm's unlimited central slope σ_i = (u_{i+1} − u_{i−1}) / 2 (LeVeque 2002, §6.5), as a user
    /// reconstruction: each face sees its two cells extrapolated half a cell.
    /// </summary>
    public static void Fromm(in Scalar leftLeft, in Scalar left, in Scalar right, in Scalar rightRight, out Scalar leftFace, out Scalar rightFace)
    {
        leftFace = new Scalar(left.Value + 0.25 * (right.Value - leftLeft.Value));
        rightFace = new Scalar(right.Value - 0.25 * (rightRight.Value - left.Value));
    }

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Fromm))]
    public static partial void Fromm1D(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Fromm))]
    public static partial void Fromm2D(StructuredGrid2D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.VanLeer)]
    public static partial void MusclVanLeer3D(StructuredGrid3D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    /// <summary>
    /// MUSCL with the van Leer limiter (LeVeque 2002, ch. 6) written by hand as a width-aware user
    /// reconstruction: slopes over centre distances, extrapolation by half a width, in the same
    /// arithmetic as the built-in <c>Linear</c> (so the two agree bitwise, patches included).
    /// </summary>
    public static void WidthAwareVanLeer(
        in Scalar leftLeft, in Scalar left, in Scalar right, in Scalar rightRight,
        double widthLeftLeft, double widthLeft, double widthRight, double widthRightRight,
        out Scalar leftFace, out Scalar rightFace)
    {
        double distanceLR = 0.5 * (widthLeft + widthRight);
        double distanceLL = 0.5 * (widthLeftLeft + widthLeft);
        double distanceRR = 0.5 * (widthRight + widthRightRight);
        double leftReach = 0.5 * widthLeft / distanceLL;
        double rightReach = 0.5 * widthRight / distanceLR;
        leftFace = new Scalar(left.Value + leftReach * VanLeerSlope(left.Value - leftLeft.Value, right.Value - left.Value, distanceLL / distanceLR));
        rightFace = new Scalar(right.Value - rightReach * VanLeerSlope(right.Value - left.Value, rightRight.Value - right.Value, distanceLR / distanceRR));
    }

    /// <summary>φ(θ)·backward for van Leer's φ(θ) = (θ + |θ|)/(1 + |θ|), θ the ratio of forward to backward slopes.</summary>
    private static double VanLeerSlope(double backward, double forward, double distanceRatio)
    {
        if (backward * forward <= 0.0)
        {
            return 0.0;
        }

        double theta = forward / backward * distanceRatio;
        double phi = (theta + Math.Abs(theta)) / (1.0 + Math.Abs(theta));
        return phi * backward;
    }

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(WidthAwareVanLeer))]
    public static partial void WidthAwareVanLeer1D(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(WidthAwareVanLeer))]
    public static partial void WidthAwareVanLeer3D(StructuredGrid3D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(WidthAwareVanLeer), Mode = ExecutionMode.ParallelGather)]
    public static partial void WidthAwareVanLeerGather3D(
        StructuredGrid3D grid, ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, [FaceData] Memory<Scalar> faceFlux, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(WidthAwareVanLeer), Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void WidthAwareVanLeerSlabs3D(StructuredGrid3D grid, ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.VanLeer, Mode = ExecutionMode.ParallelColouredScatter)]
    public static partial void MusclVanLeerSlabs3D(StructuredGrid3D grid, ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);
}

using FvGen;
using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Kernels;

/// <summary>
/// Linear advection u_t + u_x = 0 through an inflow patch and out of an outflow patch: the inflow
/// carries the exact solution u(x, t) = u0(x − t) at the time the caller sets, so that the observed
/// order measures the scheme next to the patches, not a frozen boundary value.
/// </summary>
public static partial class Transport
{
    /// <summary>
    /// The time at which the inflow patch takes the exact solution; set by the caller before each
    /// residual evaluation (one test class uses it, from one thread).
    /// </summary>
    public static double InflowTime;

    /// <summary>The smooth initial profile u0(x) = sin(2πx) + cos(2πx)/2 (non-zero slope and value at both ends).</summary>
    public static double Profile(double x) => Math.Sin(2 * Math.PI * x) + 0.5 * Math.Cos(2 * Math.PI * x);

    /// <summary>Upwind flux with unit velocity along x (common practice; LeVeque 2002, ch. 4).</summary>
    [NumericalFlux(Antisymmetric = true)]
    public static Scalar Upwind(in Scalar left, in Scalar right, in FaceGeometry face)
    {
        double an = face.Normal.X;
        return new Scalar(an * (an >= 0 ? left.Value : right.Value));
    }

    /// <summary>Upwind boundary: the inside face state leaves; the exact solution at the face enters.</summary>
    [BoundaryFlux(BoundaryKind.Inflow)]
    public static Scalar Open(in Scalar inside, in FaceGeometry face)
    {
        double an = face.Normal.X;
        return new Scalar(an * (an >= 0 ? inside.Value : Profile(face.Centroid.X - InflowTime)));
    }

    [ResidualKernel(nameof(Upwind))]
    public static partial void FirstOrder(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.Minmod)]
    public static partial void Minmod(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.VanLeer)]
    public static partial void VanLeer(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.MonotonizedCentral)]
    public static partial void MonotonizedCentral(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(WidthAwareVanLeer))]
    public static partial void UserVanLeer(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Fromm))]
    public static partial void UserFromm(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    /// <summary>The width-aware van Leer MUSCL of <see cref="Advection"/>, in this type so its kernels can name it.</summary>
    public static void WidthAwareVanLeer(
        in Scalar leftLeft, in Scalar left, in Scalar right, in Scalar rightRight,
        double widthLeftLeft, double widthLeft, double widthRight, double widthRightRight,
        out Scalar leftFace, out Scalar rightFace) =>
        Advection.WidthAwareVanLeer(leftLeft, left, right, rightRight, widthLeftLeft, widthLeft, widthRight, widthRightRight, out leftFace, out rightFace);

    /// <summary>Fromm's unlimited central slope (LeVeque 2002, §6.5), geometry-free form.</summary>
    public static void Fromm(in Scalar leftLeft, in Scalar left, in Scalar right, in Scalar rightRight, out Scalar leftFace, out Scalar rightFace) =>
        Advection.Fromm(leftLeft, left, right, rightRight, out leftFace, out rightFace);
}

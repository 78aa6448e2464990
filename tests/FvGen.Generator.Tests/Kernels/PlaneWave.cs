using FvGen;
using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Kernels;

/// <summary>
/// Linear advection of the plane wave u = sin(2π(x + y − 1.5 t)) with velocity (1, 0.5): an exact
/// solution (u_t + a·∇u = −1.5 f' + 1.5 f' = 0), used only by the unstructured order test.
/// </summary>
/// <remarks>
/// Inflow patches prescribe the exact solution at the stage time, which the test sets in
/// <see cref="Time"/> before each residual evaluation (test-only state; nothing else uses this type).
/// </remarks>
public static partial class PlaneWave
{
    public static readonly Vec3 Velocity = new(1.0, 0.5, 0.0);

    /// <summary>The time of the residual being evaluated.</summary>
    public static double Time { get; set; }

    public static double Exact(Vec3 p, double t) => Math.Sin(2 * Math.PI * (p.X + p.Y - 1.5 * t));

    [NumericalFlux(Antisymmetric = true)]
    public static Scalar Upwind(in Scalar left, in Scalar right, in FaceGeometry face)
    {
        double an = Vec3.Dot(Velocity, face.Normal);
        return new Scalar(an * (an >= 0 ? left.Value : right.Value));
    }

    /// <summary>Upwind at the boundary: the exact solution flows in, the inside state flows out.</summary>
    [BoundaryFlux(BoundaryKind.Inflow)]
    public static Scalar Prescribed(in Scalar inside, in FaceGeometry face)
    {
        double an = Vec3.Dot(Velocity, face.Normal);
        return new Scalar(an * (an >= 0 ? inside.Value : Exact(face.Centroid, Time)));
    }

    [ResidualKernel(nameof(Upwind))]
    public static partial void FirstOrder(UnstructuredMesh mesh, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear)]
    public static partial void Linear(
        UnstructuredMesh mesh, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, Span<Gradient<Scalar>> gradients, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);
}

using FvGen;
using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Kernels;

/// <summary>Inviscid Burgers' equation u_t + (u²/2)_x = 0 with the Godunov flux.</summary>
public static partial class Burgers
{
    /// <summary>
    /// Godunov flux of f(u) = u²/2 along +x (LeVeque 2002, §12.2): min of f over [uL, uR] when uL ≤ uR,
    /// max of f(uL), f(uR) otherwise. A face whose normal points along −x uses F(a, b, n) = −F(b, a, −n).
    /// </summary>
    [NumericalFlux(Antisymmetric = true)]
    public static Scalar Godunov(in Scalar left, in Scalar right, in FaceGeometry face)
    {
        double n = face.Normal.X;
        double uL = n >= 0 ? left.Value : right.Value;
        double uR = n >= 0 ? right.Value : left.Value;
        double flux;
        if (uL <= uR)
        {
            flux = uL > 0 ? 0.5 * uL * uL : uR < 0 ? 0.5 * uR * uR : 0.0;
        }
        else
        {
            flux = Math.Max(0.5 * uL * uL, 0.5 * uR * uR);
        }

        return new Scalar(n * flux);
    }

    /// <summary>Transmissive boundary: the physical flux of the inside state.</summary>
    [BoundaryFlux(BoundaryKind.Outflow)]
    public static Scalar Transmissive(in Scalar inside, in FaceGeometry face) => new(face.Normal.X * 0.5 * inside.Value * inside.Value);

    [ResidualKernel(nameof(Godunov))]
    public static partial void FirstOrder(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Godunov), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.VanLeer)]
    public static partial void MusclVanLeer(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);

    [ResidualKernel(nameof(Godunov), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.MonotonizedCentral)]
    public static partial void MusclMC(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);
}

// expect: FVC0004
// why: the neighbour's y-momentum receives flux.MomentumX, so flux.MomentumY leaves the owner without entering any cell and flux.MomentumX enters the y-momentum of one cell only.
using System;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace Corpus.Unstructured;

/// <summary>Conserved state of an isothermal gas (density and two momentum components).</summary>
public struct IsothermalGas
{
    public double Density;
    public double MomentumX;
    public double MomentumY;
}

/// <summary>Isothermal gas flow in a two-dimensional manifold on a triangle mesh.</summary>
public static class ManifoldGasResidual
{
    private const double SoundSpeed = 340.0;

    [FvGen.NumericalFlux]
    public static IsothermalGas Rusanov(in IsothermalGas a, in IsothermalGas b, in Vec3 n)
    {
        double una = (a.MomentumX * n.X + a.MomentumY * n.Y) / a.Density;
        double unb = (b.MomentumX * n.X + b.MomentumY * n.Y) / b.Density;
        double speed = Math.Max(Math.Abs(una), Math.Abs(unb)) + SoundSpeed;
        double c2 = SoundSpeed * SoundSpeed;
        return new IsothermalGas
        {
            Density = 0.5 * (a.Density * una + b.Density * unb) - 0.5 * speed * (b.Density - a.Density),
            MomentumX = 0.5 * (a.MomentumX * una + c2 * a.Density * n.X + b.MomentumX * unb + c2 * b.Density * n.X) - 0.5 * speed * (b.MomentumX - a.MomentumX),
            MomentumY = 0.5 * (a.MomentumY * una + c2 * a.Density * n.Y + b.MomentumY * unb + c2 * b.Density * n.Y) - 0.5 * speed * (b.MomentumY - a.MomentumY),
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, IsothermalGas[] state, IsothermalGas[] residual)
    {
        ReadOnlySpan<int> left = mesh.FaceLeft;
        ReadOnlySpan<int> right = mesh.FaceRight;
        ReadOnlySpan<Vec3> normals = mesh.FaceNormals;
        ReadOnlySpan<double> areas = mesh.FaceAreas;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int l = left[f], r = right[f];
            IsothermalGas flux = Rusanov(state[l], state[r], normals[f]);
            double area = areas[f];
            residual[l].Density -= flux.Density * area;
            residual[r].Density += flux.Density * area;
            residual[l].MomentumX -= flux.MomentumX * area;
            residual[r].MomentumX += flux.MomentumX * area;
            residual[l].MomentumY -= flux.MomentumY * area;
            residual[r].MomentumY += flux.MomentumX * area;
        }
    }
}

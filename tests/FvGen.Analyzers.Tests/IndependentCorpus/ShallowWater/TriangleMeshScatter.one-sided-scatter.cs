// expect: FVC0004
// why: the depth flux is taken from the cell behind but the line giving it to the cell ahead was deleted.
using System;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace Corpus.ShallowWater;

public struct TidalState
{
    public double Depth;
    public double DischargeX;
    public double DischargeY;
}

/// <summary>Tidal inflow into a harbour basin on a triangle mesh.</summary>
public static class HarbourTideResidual
{
    private const double G = 9.81;

    [FvGen.NumericalFlux(Antisymmetric = true)]
    public static TidalState Rusanov(in TidalState a, in TidalState b, in Vec3 n)
    {
        double una = (a.DischargeX * n.X + a.DischargeY * n.Y) / a.Depth;
        double unb = (b.DischargeX * n.X + b.DischargeY * n.Y) / b.Depth;
        double s = Math.Max(Math.Abs(una) + Math.Sqrt(G * a.Depth), Math.Abs(unb) + Math.Sqrt(G * b.Depth));
        double pa = 0.5 * G * a.Depth * a.Depth, pb = 0.5 * G * b.Depth * b.Depth;
        return new TidalState
        {
            Depth = 0.5 * (a.Depth * una + b.Depth * unb) - 0.5 * s * (b.Depth - a.Depth),
            DischargeX = 0.5 * (a.DischargeX * una + pa * n.X + b.DischargeX * unb + pb * n.X) - 0.5 * s * (b.DischargeX - a.DischargeX),
            DischargeY = 0.5 * (a.DischargeY * una + pa * n.Y + b.DischargeY * unb + pb * n.Y) - 0.5 * s * (b.DischargeY - a.DischargeY),
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, TidalState[] s, TidalState[] residual)
    {
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        var normals = mesh.FaceNormals;
        var areas = mesh.FaceAreas;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int behind = left[f];
            int ahead = right[f];
            TidalState flux = Rusanov(s[behind], s[ahead], normals[f]);
            double area = areas[f];

            residual[behind].Depth -= area * flux.Depth;
            residual[behind].DischargeX -= area * flux.DischargeX;
            residual[behind].DischargeY -= area * flux.DischargeY;

            residual[ahead].DischargeX += area * flux.DischargeX;
            residual[ahead].DischargeY += area * flux.DischargeY;
        }
    }
}

// expect: FVC0004
// why: a copy-pasted line gives the face flux back to residual[owner] instead of residual[neighbour], so the flux cancels inside one cell and the neighbour never sees it.
using System;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace Corpus.Unstructured;

/// <summary>Upwind transport of a salinity field on an unstructured estuary mesh, serial face scatter.</summary>
public static class EstuarySalinityResidual
{
    /// <summary>Upwind flux through a face with normal volume flow <paramref name="flow"/> (left to right positive).</summary>
    [FvGen.NumericalFlux]
    public static double Upwind(double left, double right, double flow) => flow >= 0 ? flow * left : flow * right;

    [FvGen.ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, ReadOnlySpan<double> salinity, Span<double> residual, Vec3 current)
    {
        ReadOnlySpan<int> left = mesh.FaceLeft;
        ReadOnlySpan<int> right = mesh.FaceRight;
        ReadOnlySpan<Vec3> areaVectors = mesh.FaceAreaVectors;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int owner = left[f];
            int neighbour = right[f];
            double flux = Upwind(salinity[owner], salinity[neighbour], Vec3.Dot(current, areaVectors[f]));
            residual[owner] -= flux;
            residual[owner] += flux;
        }
    }
}

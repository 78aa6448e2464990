// expect: FVC0006
// why: the upwind flux counts reversed faces in a static field, so the numerical flux writes state outside itself.
using System;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace Corpus.Unstructured;

/// <summary>Upwind transport of a salinity field on an unstructured estuary mesh, serial face scatter.</summary>
public static class EstuarySalinityResidual
{
    /// <summary>Upwind flux through a face with normal volume flow <paramref name="flow"/> (left to right positive).</summary>
    [FvGen.NumericalFlux]
    public static double Upwind(double left, double right, double flow)
    {
        if (flow < 0)
        {
            ReversedFaces++;
            return flow * right;
        }

        return flow * left;
    }

    /// <summary>How many faces saw flow from right to left, for a log line.</summary>
    public static int ReversedFaces;

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
            residual[neighbour] += flux;
        }
    }
}

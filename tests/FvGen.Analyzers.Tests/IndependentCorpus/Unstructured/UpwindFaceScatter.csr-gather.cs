// expect: FVC0100
// why: the cell-by-cell gather picks the flux sign with left[f] == c and walks a data-dependent face range, which the checker cannot model; it is conservative, but must be reported as not analysed.
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
        ReadOnlySpan<int> offsets = mesh.CellFaceOffsets;
        ReadOnlySpan<int> cellFaces = mesh.CellFaces;
        for (int c = 0; c < mesh.CellCount; c++)
        {
            // Gather: each cell sums its own faces, no write conflicts between cells.
            double sum = 0.0;
            for (int k = offsets[c]; k < offsets[c + 1]; k++)
            {
                int f = cellFaces[k];
                if (f >= mesh.InteriorFaceCount)
                {
                    continue;
                }

                double flux = Upwind(salinity[left[f]], salinity[right[f]], Vec3.Dot(current, areaVectors[f]));
                sum += left[f] == c ? -flux : flux;
            }

            residual[c] = sum;
        }
    }
}

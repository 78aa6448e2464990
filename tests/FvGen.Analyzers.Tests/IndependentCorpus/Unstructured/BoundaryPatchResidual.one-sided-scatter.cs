// expect: FVC0004
// why: the interior conduction is added to residual[l] but never removed from residual[r], so each interior face flux enters one cell only.
using System;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace Corpus.Unstructured;

/// <summary>Heat residual of a cooling fin: interior conduction plus convective loss on every boundary patch.</summary>
public static class CoolingFinResidual
{
    [FvGen.ConservativeUpdate]
    public static void Residual(
        UnstructuredMesh mesh, ReadOnlySpan<double> temperature, Span<double> residual,
        double conductivity, double filmCoefficient, double ambient)
    {
        ReadOnlySpan<int> left = mesh.FaceLeft;
        ReadOnlySpan<int> right = mesh.FaceRight;
        ReadOnlySpan<double> area = mesh.FaceAreas;
        ReadOnlySpan<double> distance = mesh.FaceCentreDistances;

        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int l = left[f];
            int r = right[f];
            double conducted = conductivity * (temperature[r] - temperature[l]) / distance[f] * area[f];
            residual[l] += conducted;
        }

        foreach (BoundaryPatch patch in mesh.Patches)
        {
            for (int f = patch.FirstFace; f < patch.EndFace; f++)
            {
                int inside = left[f];
                double lost = filmCoefficient * (temperature[inside] - ambient) * area[f];
                residual[inside] -= lost;
            }
        }
    }
}

// expect: FVC0004
// why: both cells of the face receive q (+= twice), so the face flux is created instead of moved between them.
using System;
using FvGen.Meshes.Unstructured;

namespace Corpus.Unstructured;

/// <summary>Groundwater head diffusion on a Voronoi-like polygon mesh with a cell-wise hydraulic conductivity.</summary>
public static class GroundwaterHeadRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate(UnstructuredMesh mesh, double[] head, double[] conductivity, double[] rate)
    {
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        var areas = mesh.FaceAreas;
        var distances = mesh.FaceCentreDistances;
        for (int face = 0; face < mesh.InteriorFaceCount; face++)
        {
            int upstream = left[face];
            int downstream = right[face];
            // Harmonic face conductivity keeps the flux continuous across material contrasts.
            double kFace = 2.0 * conductivity[upstream] * conductivity[downstream] / (conductivity[upstream] + conductivity[downstream]);
            double q = kFace * (head[downstream] - head[upstream]) / distances[face] * areas[face];
            rate[upstream] += q;
            rate[downstream] += q;
        }
    }
}

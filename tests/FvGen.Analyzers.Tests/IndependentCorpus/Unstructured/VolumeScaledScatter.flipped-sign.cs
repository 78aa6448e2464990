// expect: FVC0004
// why: both cells of the face lose the transfer (-= twice), so the face flux is removed from the domain instead of moved across the face.
using System;
using FvGen.Meshes.Unstructured;

namespace Corpus.Unstructured;

/// <summary>Rate of a pollutant in a ventilated building zone model, face flux per unit area given per face.</summary>
public static class ZoneModelRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate(UnstructuredMesh mesh, [FvGen.FaceData] ReadOnlySpan<double> fluxPerArea, Span<double> rate)
    {
        ReadOnlySpan<int> owners = mesh.FaceLeft;
        ReadOnlySpan<int> neighbours = mesh.FaceRight;
        ReadOnlySpan<double> areas = mesh.FaceAreas;
        ReadOnlySpan<double> volumes = mesh.CellVolumes;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int a = owners[f];
            int b = neighbours[f];
            double transfer = fluxPerArea[f] * areas[f];
            rate[a] -= transfer / volumes[a];
            rate[b] -= transfer / volumes[b];
        }
    }
}

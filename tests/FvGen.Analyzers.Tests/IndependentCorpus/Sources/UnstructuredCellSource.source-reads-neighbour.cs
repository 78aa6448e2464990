// expect: FVC0001
// why: the generation loop reads heat[c + 1] into cell c, so it is no source and the term heat[•+1]*volume[•] has no counterpart.
using System;
using FvGen.Meshes.Unstructured;

namespace Corpus.Sources;

/// <summary>Heat residual of a battery module: conduction across faces plus volumetric heat generation per cell.</summary>
public static class BatteryModuleResidual
{
    [FvGen.ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] temperature, double[] heat, double[] residual, double conductivity)
    {
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        var area = mesh.FaceAreas;
        var distance = mesh.FaceCentreDistances;
        var volume = mesh.CellVolumes;

        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int a = left[f], b = right[f];
            double q = conductivity * area[f] * (temperature[b] - temperature[a]) / distance[f];
            residual[a] += q;
            residual[b] -= q;
        }

        for (int c = 0; c < mesh.CellCount; c++)
        {
            residual[c] += heat[c + 1] * volume[c];
        }
    }
}

// expect: FVC0004
// why: the second line writes mesh.FaceLeft[f] again, so the convective flux is taken from and given back to the same cell.
using System;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace Corpus.Unstructured;

/// <summary>Central flux of a passive dye in a slow, divergence-free flow on a tetrahedral mesh.</summary>
public static class TetDyeResidual
{
    [FvGen.ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] dye, [FvGen.FaceData] double[] volumeFlow, double[] residual)
    {
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            double faceValue = 0.5 * (dye[mesh.FaceLeft[f]] + dye[mesh.FaceRight[f]]);
            residual[mesh.FaceLeft[f]] -= volumeFlow[f] * faceValue;
            residual[mesh.FaceLeft[f]] += volumeFlow[f] * faceValue;
        }
    }
}

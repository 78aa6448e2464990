// expect: FVC0004
// why: the face loop reads dye on both sides of the face but writes only residual[mesh.FaceLeft[f]].
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
        }
    }
}

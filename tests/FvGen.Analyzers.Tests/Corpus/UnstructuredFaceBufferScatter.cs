// Two passes over faces: fluxes into a face buffer, then a scatter of the buffer to owner and neighbour.
// mutant: FVC0004 one-sided: `            res[right[f]] += faceFlux[f];` -> ``
// mutant: FVC0004 unequal: `res[right[f]] += faceFlux[f];` -> `res[right[f]] += 0.5 * faceFlux[f];`
// mutant: FVC0004 wrong-face: `res[right[f]] += faceFlux[f];` -> `res[right[f]] += faceFlux[left[f]];`
using System;
using FvGen;
using FvGen.Meshes.Unstructured;

public static class FaceBufferScatter
{
    private static double Flux(double a, double b) => 0.5 * (a + b);

    [ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] u, double[] res)
    {
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        var faceFlux = new double[mesh.FaceCount];
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            faceFlux[f] = Flux(u[left[f]], u[right[f]]);
        }

        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            res[left[f]] -= faceFlux[f];
            res[right[f]] += faceFlux[f];
        }
    }
}

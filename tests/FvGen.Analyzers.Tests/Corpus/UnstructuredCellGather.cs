// Two passes: interior face fluxes into a face buffer, then each cell sums its faces from the mesh's cell-to-face list.
// mutant: FVC0004 both-subtract: `else sum += faceFlux[f];` -> `else sum -= faceFlux[f];`
// mutant: FVC0004 right-side-dropped: `else sum += faceFlux[f];` -> ``
// mutant: FVC0004 half-weight: `else sum += faceFlux[f];` -> `else sum += 0.5 * faceFlux[f];`
using System;
using FvGen;
using FvGen.Meshes.Unstructured;

public static class CellGather
{
    private static double Flux(double a, double b) => 0.5 * (a + b);

    [ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] u, double[] res)
    {
        ReadOnlySpan<int> left = mesh.FaceLeft;
        ReadOnlySpan<int> right = mesh.FaceRight;
        ReadOnlySpan<int> start = mesh.CellFaceOffsets;
        ReadOnlySpan<int> faces = mesh.CellFaces;
        ReadOnlySpan<double> volume = mesh.CellVolumes;
        var faceFlux = new double[mesh.FaceCount];
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            faceFlux[f] = Flux(u[left[f]], u[right[f]]);
        }

        for (int c = 0; c < mesh.CellCount; c++)
        {
            double sum = 0.0;
            for (int n = start[c]; n < start[c + 1]; n++)
            {
                int f = faces[n];
                if (left[f] == c) sum -= faceFlux[f];
                else sum += faceFlux[f];
            }

            res[c] = sum / volume[c];
        }
    }
}

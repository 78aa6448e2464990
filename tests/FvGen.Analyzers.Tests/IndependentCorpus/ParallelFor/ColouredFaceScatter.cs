// expect: none
// why: within each colour the faces share no cell and run in parallel; each face flux is taken from residual[left[f]] and given to residual[right[f]] with the same weight.
using System;
using System.Threading.Tasks;
using FvGen.Meshes.Unstructured;

namespace Corpus.ParallelFor;

/// <summary>Parallel face scatter over a face colouring for heat spreading in a printed circuit board.</summary>
public static class CircuitBoardScatter
{
    [FvGen.ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] temperature, double[] residual, double conductivity)
    {
        int[] left = mesh.FaceLeft.ToArray();
        int[] right = mesh.FaceRight.ToArray();
        double[] area = mesh.FaceAreas.ToArray();
        double[] distance = mesh.FaceCentreDistances.ToArray();
        FaceColouring colouring = mesh.FaceColouring;
        int[] colouredFaces = colouring.Faces.ToArray();
        int[] colourOffsets = colouring.ColourOffsets.ToArray();

        for (int colour = 0; colour < colouring.ColourCount; colour++)
        {
            Parallel.For(colourOffsets[colour], colourOffsets[colour + 1], k =>
            {
                int f = colouredFaces[k];
                double q = conductivity * area[f] * (temperature[right[f]] - temperature[left[f]]) / distance[f];
                residual[left[f]] += q;
                residual[right[f]] -= q;
            });
        }
    }
}

// expect: none
// why: for each face in the list the flux is taken from the cell behind it and given to the cell in front with equal weight.
using System;
using System.Collections.Generic;
using FvGen.Meshes.Unstructured;

namespace Corpus.Unstructured;

/// <summary>Flux exchange across the faces of one mesh zone (say, the faces inside a filter element).</summary>
public static class FilterZoneExchange
{
    [FvGen.ConservativeUpdate]
    public static void Exchange(
        UnstructuredMesh mesh, IReadOnlyList<int> zoneFaces, [FvGen.FaceData] double[] faceFlux, double[] residual)
    {
        ReadOnlySpan<int> behind = mesh.FaceLeft;
        ReadOnlySpan<int> inFront = mesh.FaceRight;
        ReadOnlySpan<double> area = mesh.FaceAreas;
        foreach (int f in zoneFaces)
        {
            double amount = faceFlux[f] * area[f];
            residual[behind[f]] -= amount;
            residual[inFront[f]] += amount;
        }
    }
}

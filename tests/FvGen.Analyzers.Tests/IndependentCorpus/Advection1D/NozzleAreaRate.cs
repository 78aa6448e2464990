// expect: none
// why: the face term area[•]*flux[•] leaves cell i at face i+1 and enters it at face i with weights -1 and +1; volume[i] is the cell measure.
using System;

namespace Corpus.Advection1D;

/// <summary>Quasi-one-dimensional transport of a solute through a converging channel of varying cross-section.</summary>
public static class ConvergingChannelSolute
{
    /// <summary>
    /// Face i lies between cells i-1 and i; faceArea and faceFlux have one more entry than there are cells.
    /// </summary>
    [FvGen.ConservativeUpdate]
    public static void Rate(
        [FvGen.FaceData] double[] faceArea,
        [FvGen.FaceData] double[] faceFlux,
        double[] cellVolume,
        double[] rate)
    {
        for (int i = 0; i < cellVolume.Length; i++)
        {
            double inflow = faceArea[i] * faceFlux[i];
            double outflow = faceArea[i + 1] * faceFlux[i + 1];
            rate[i] = (inflow - outflow) / cellVolume[i];
        }
    }
}

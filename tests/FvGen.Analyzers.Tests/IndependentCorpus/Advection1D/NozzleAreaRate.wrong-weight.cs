// expect: FVC0001
// why: the outflow uses the cell's own inlet area, so faceArea[i]*faceFlux[i + 1] and faceArea[i]*faceFlux[i] are two different face terms, each with no counterpart in the neighbour.
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
            double outflow = faceArea[i] * faceFlux[i + 1];
            rate[i] = (inflow - outflow) / cellVolume[i];
        }
    }
}

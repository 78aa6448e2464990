// expect: none
// why: the rate is assembled in two writes per cell, -flux[i + 1]/dx then += flux[i]/dx; summed, the face class flux[•] collects -1/dx + 1/dx = 0.
using System;

namespace Corpus.Advection1D;

/// <summary>Rate of a heated oil slug in a pipeline, assembled outflow first, then inflow, one compound assignment each.</summary>
public static class OilSlugRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate([FvGen.FaceData] double[] flux, double[] rate, double dx)
    {
        for (int i = 0; i < rate.Length; i++)
        {
            rate[i] = -flux[i + 1] / dx;   // out through the downstream face
            rate[i] += flux[i] / dx;       // in through the upstream face
        }
    }
}

// expect: FVC0001
// why: the second write uses = instead of +=, so it overwrites the outflow and only the inflow flux[i]/dx is left, a face term with no counterpart.
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
            rate[i] = flux[i] / dx;       // in through the upstream face
        }
    }
}

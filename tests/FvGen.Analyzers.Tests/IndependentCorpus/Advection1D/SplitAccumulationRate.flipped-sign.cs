// expect: FVC0002
// why: the inflow is accumulated with -= instead of +=, so flux[•] collects -2/dx instead of cancelling.
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
            rate[i] -= flux[i] / dx;       // in through the upstream face
        }
    }
}

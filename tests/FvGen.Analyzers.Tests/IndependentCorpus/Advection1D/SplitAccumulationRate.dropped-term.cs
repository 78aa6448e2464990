// expect: FVC0001
// why: the second line that adds the inflow flux[i]/dx was lost, so the outflow flux[i + 1] leaves every cell and enters none.
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
        }
    }
}

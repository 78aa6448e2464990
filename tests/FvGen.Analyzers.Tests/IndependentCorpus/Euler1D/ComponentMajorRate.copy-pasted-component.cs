// expect: FVC0001
// why: the outflow reads flux[0][i + 1] (the density row) for every component k, so flux[0][•+1] and flux[k][•] have different linear parts and neither has a counterpart.
using System;

namespace Corpus.Euler1D;

/// <summary>Euler rate with component-major jagged storage (flux[k][face], rate[k][cell]), as some legacy codes keep it.</summary>
public static class ComponentMajorEulerRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate([FvGen.FaceData] double[][] flux, double[][] rate, double dx)
    {
        for (int k = 0; k < rate.Length; k++)
        {
            for (int i = 0; i < rate[k].Length; i++)
            {
                rate[k][i] = (flux[k][i] - flux[0][i + 1]) / dx;
            }
        }
    }
}

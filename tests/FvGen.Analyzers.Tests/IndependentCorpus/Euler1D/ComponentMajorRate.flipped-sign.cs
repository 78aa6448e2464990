// expect: FVC0002
// why: both faces are added, so every component of flux[•][•] collects +2/dx instead of cancelling.
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
                rate[k][i] = (flux[k][i] + flux[k][i + 1]) / dx;
            }
        }
    }
}

// expect: none
// why: with the component k as an outer loop variable, flux[k][i] and flux[k][i + 1] are one lattice class per component and cancel with +1/dx and -1/dx.
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
                rate[k][i] = (flux[k][i] - flux[k][i + 1]) / dx;
            }
        }
    }
}

// expect: none
// why: the face-data class flux[•] enters with -1/dx at face i+1 and +1/dx at face i, which cancel.
using System;

namespace Corpus.Advection1D;

/// <summary>Rate of a heat-carrying coolant plug from precomputed face fluxes, span-based.</summary>
public static class CoolantPlugRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate([FvGen.FaceData] ReadOnlySpan<double> flux, Span<double> rate, double dx)
    {
        // flux has rate.Length + 1 entries: flux[i] is the face on the left of cell i.
        double inverseDx = 1.0 / dx;
        for (int i = 0; i < rate.Length; i++)
        {
            rate[i] = -(flux[i + 1] - flux[i]) * inverseDx;
        }
    }
}

// expect: none
// why: the flux buffer interleaves two components per face (index 2*f and 2*f+1); the mass rate reads 2*i and 2*i+2, the momentum rate 2*i+1 and 2*i+3, each pair one lattice class under the map 2*i.
using System;

namespace Corpus.TwoPass;

/// <summary>Isothermal pipe flow with an interleaved face-flux buffer [mass, momentum] per face.</summary>
public static class InterleavedPipeFlowRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate(
        [FvGen.FaceData] double[] interleavedFlux,
        double[] massRate, double[] momentumRate, double dx)
    {
        for (int i = 0; i < massRate.Length; i++)
        {
            massRate[i] = (interleavedFlux[2 * i] - interleavedFlux[2 * i + 2]) / dx;
            momentumRate[i] = (interleavedFlux[2 * i + 1] - interleavedFlux[2 * i + 3]) / dx;
        }
    }
}

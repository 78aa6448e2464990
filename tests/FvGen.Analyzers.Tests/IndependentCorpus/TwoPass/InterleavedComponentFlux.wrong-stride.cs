// expect: FVC0001
// why: the momentum outflow reads slot 2*i + 2 (the next face's mass) instead of 2*i + 3; the offsets 1 and 2 differ by an odd number, no lattice shift of 2*i, so neither term has a counterpart.
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
            momentumRate[i] = (interleavedFlux[2 * i + 1] - interleavedFlux[2 * i + 2]) / dx;
        }
    }
}

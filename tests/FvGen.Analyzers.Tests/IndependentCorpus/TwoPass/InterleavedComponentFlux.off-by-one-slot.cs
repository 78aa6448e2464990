// expect: FVC0001
// why: the mass outflow reads 2*i + 1, the momentum slot of the same face; 2*i and 2*i + 1 are not lattice shifts of each other, so both mass terms lose their counterparts.
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
            massRate[i] = (interleavedFlux[2 * i] - interleavedFlux[2 * i + 1]) / dx;
            momentumRate[i] = (interleavedFlux[2 * i + 1] - interleavedFlux[2 * i + 3]) / dx;
        }
    }
}

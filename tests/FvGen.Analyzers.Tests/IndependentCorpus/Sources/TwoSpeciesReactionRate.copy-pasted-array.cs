// expect: FVC0001
// why: the rate of B subtracts fluxA[i + 1], so in the B equation fluxB[•] enters with no counterpart and fluxA[•] leaves with none.
using System;

namespace Corpus.Sources;

/// <summary>Transport with a bimolecular reaction A + B -&gt; 2B in a plug-flow reactor.</summary>
public static class PlugFlowReactorRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate(
        [FvGen.FaceData] double[] fluxA, [FvGen.FaceData] double[] fluxB,
        double[] a, double[] b, double[] rateA, double[] rateB, double k, double dx)
    {
        for (int i = 0; i < a.Length; i++)
        {
            double reaction = k * a[i] * b[i];
            rateA[i] = (fluxA[i] - fluxA[i + 1]) / dx - reaction;
            rateB[i] = (fluxB[i] - fluxA[i + 1]) / dx + reaction;
        }
    }
}

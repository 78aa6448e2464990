// expect: none
// why: each species' face flux cancels between faces i and i+1; the reaction k*a[i]*b[i] reads the target cell only and is a source (a sink for A, a gain for B).
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
            rateB[i] = (fluxB[i] - fluxB[i + 1]) / dx + reaction;
        }
    }
}

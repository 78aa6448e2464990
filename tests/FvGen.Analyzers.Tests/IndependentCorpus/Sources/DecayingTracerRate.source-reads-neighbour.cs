// expect: FVC0001
// why: the decay term reads concentration[i - 1], so it is no longer a source of cell i and the term concentration[•-1] has no counterpart.
using System;

namespace Corpus.Sources;

/// <summary>Radioactive tracer in groundwater: face fluxes plus first-order decay (decay constant lambda).</summary>
public static class DecayingTracer
{
    [FvGen.ConservativeUpdate]
    public static void Rate([FvGen.FaceData] double[] flux, double[] concentration, double[] rate, double lambda, double dx)
    {
        for (int i = 0; i < concentration.Length; i++)
        {
            rate[i] = -(flux[i + 1] - flux[i]) / dx - lambda * concentration[i - 1];
        }
    }
}

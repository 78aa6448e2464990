// expect: FVC0002
// why: the face flux difference became a sum, so flux[•] collects -2/dx instead of cancelling.
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
            rate[i] = -(flux[i + 1] + flux[i]) / dx - lambda * concentration[i];
        }
    }
}

// expect: FVC0002
// why: the old-state weights become 1 - courant - courant, not 1: the upwind inflow courant*tracer[i-1] is subtracted instead of added.
using System;

namespace Corpus.Advection1D;

/// <summary>Explicit first-order upwind step for a tracer pulse in a pipe (velocity &gt; 0, courant = velocity*dt/dx).</summary>
public static class TracerPipeStep
{
    [FvGen.ConservativeUpdate]
    public static void Advance(double[] tracer, double[] next, double courant)
    {
        if (courant is <= 0 or > 1)
        {
            throw new ArgumentOutOfRangeException(nameof(courant), courant, "The upwind step needs 0 < courant <= 1.");
        }

        for (int i = 1; i < tracer.Length; i++)
        {
            next[i] = tracer[i] - courant * (tracer[i] + tracer[i - 1]);
        }
    }
}

// expect: FVC0001
// why: the liquid update subtracts outflow.Solids, so faces[•].Liquid enters with no counterpart and faces[•].Solids leaves the liquid with none.
using System;

namespace Corpus.TwoPass;

public struct SlurryState
{
    public double Solids;
    public double Liquid;
}

/// <summary>Two-component slurry in a tailings pipeline, face buffer then cell step.</summary>
public static class TailingsPipelineStep
{
    [FvGen.NumericalFlux]
    public static SlurryState DriftFlux(in SlurryState a, in SlurryState b, double velocity, double settling) => new()
    {
        Solids = velocity >= 0 ? (velocity - settling) * a.Solids : (velocity - settling) * b.Solids,
        Liquid = velocity >= 0 ? velocity * a.Liquid : velocity * b.Liquid,
    };

    [FvGen.ConservativeUpdate]
    public static void Advance(SlurryState[] u, SlurryState[] next, double velocity, double settling, double dt, double dx)
    {
        var faces = new SlurryState[u.Length + 1];
        for (int f = 1; f < u.Length; f++)
        {
            faces[f] = DriftFlux(u[f - 1], u[f], velocity, settling);
        }

        double ratio = dt / dx;
        for (int i = 1; i < u.Length - 1; i++)
        {
            SlurryState inflow = faces[i];
            SlurryState outflow = faces[i + 1];
            next[i].Solids = u[i].Solids + ratio * (inflow.Solids - outflow.Solids);
            next[i].Liquid = u[i].Liquid + ratio * (inflow.Liquid - outflow.Solids);
        }
    }
}

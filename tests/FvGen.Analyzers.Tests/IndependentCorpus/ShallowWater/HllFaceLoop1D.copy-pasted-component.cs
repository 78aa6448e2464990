// expect: FVC0004
// why: cell f receives flux.Depth in its discharge, so flux.Discharge is taken from cell f-1 only and flux.Depth is given to the discharge of one cell only.
using System;

namespace Corpus.ShallowWater;

public struct SurgeState
{
    public double Depth;
    public double Discharge;
}

/// <summary>Storm-surge bore running up a tidal river, face-by-face HLL assembly.</summary>
public static class TidalBoreFaceLoop
{
    private const double G = 9.81;

    [FvGen.NumericalFlux]
    public static SurgeState Hll(in SurgeState l, in SurgeState r)
    {
        double ul = l.Discharge / l.Depth, ur = r.Discharge / r.Depth;
        double cl = Math.Sqrt(G * l.Depth), cr = Math.Sqrt(G * r.Depth);
        double sl = Math.Min(ul - cl, ur - cr), sr = Math.Max(ul + cl, ur + cr);
        double fhL = l.Discharge, fhR = r.Discharge;
        double fqL = l.Discharge * ul + 0.5 * G * l.Depth * l.Depth;
        double fqR = r.Discharge * ur + 0.5 * G * r.Depth * r.Depth;
        if (sl >= 0) return new SurgeState { Depth = fhL, Discharge = fqL };
        if (sr <= 0) return new SurgeState { Depth = fhR, Discharge = fqR };
        double w = 1.0 / (sr - sl);
        return new SurgeState
        {
            Depth = w * (sr * fhL - sl * fhR + sl * sr * (r.Depth - l.Depth)),
            Discharge = w * (sr * fqL - sl * fqR + sl * sr * (r.Discharge - l.Discharge)),
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(SurgeState[] s, SurgeState[] rate, double dx)
    {
        // The caller zeroes rate and adds the boundary faces.
        for (int f = 1; f < s.Length; f++)
        {
            SurgeState flux = Hll(s[f - 1], s[f]);
            rate[f - 1].Depth -= flux.Depth / dx;
            rate[f - 1].Discharge -= flux.Discharge / dx;
            rate[f].Depth += flux.Depth / dx;
            rate[f].Discharge += flux.Depth / dx;
        }
    }
}

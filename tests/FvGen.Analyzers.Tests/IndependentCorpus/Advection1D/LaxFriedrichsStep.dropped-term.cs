// expect: FVC0001
// why: the face term SmokeFlux(c[i - 1]) was dropped, so SmokeFlux(c[i + 1]) leaves cell i with no counterpart entering any cell.
using System;

namespace Corpus.Advection1D;

/// <summary>Lax-Friedrichs step for smoke concentration in a ventilation duct with a concentration-dependent drift speed.</summary>
public static class DuctSmokeLaxFriedrichs
{
    // Drift speed grows slightly with concentration (invented closure): f(c) = c * (1 + 0.1 c).
    private static double SmokeFlux(double c) => c * (1.0 + 0.1 * c);

    [FvGen.ConservativeUpdate]
    public static void Advance(double[] c, double[] next, double dt, double dx)
    {
        double ratio = dt / dx;
        for (int i = 1; i < c.Length - 1; i++)
        {
            next[i] = (c[i - 1] + c[i + 1]) / 2 - 0.5 * ratio * SmokeFlux(c[i + 1]);
        }
    }
}

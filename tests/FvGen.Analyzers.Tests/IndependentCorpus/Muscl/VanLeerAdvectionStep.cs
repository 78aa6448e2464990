// expect: none
// why: the old state carries 1 - c + c = 1 and the limited-slope class VanLeer(Δu[•], Δu[•+1]) collects -c/2 at the east face and +c/2 at the west face.
using System;

namespace Corpus.Muscl;

/// <summary>Second-order upwind step for a contaminant front in a pipeline (velocity &gt; 0), van Leer limiter.</summary>
public static class PipelineFrontVanLeer
{
    /// <summary>Van Leer's harmonic limiter on two one-sided differences.</summary>
    public static double VanLeer(double backward, double forward) =>
        backward * forward > 0 ? 2.0 * backward * forward / (backward + forward) : 0.0;

    [FvGen.ConservativeUpdate]
    public static void Advance(double[] u, double[] next, double courant)
    {
        for (int i = 2; i < u.Length - 1; i++)
        {
            double eastFace = u[i] + 0.5 * VanLeer(u[i] - u[i - 1], u[i + 1] - u[i]);
            double westFace = u[i - 1] + 0.5 * VanLeer(u[i - 1] - u[i - 2], u[i] - u[i - 1]);
            next[i] = u[i] - courant * (eastFace - westFace);
        }
    }
}

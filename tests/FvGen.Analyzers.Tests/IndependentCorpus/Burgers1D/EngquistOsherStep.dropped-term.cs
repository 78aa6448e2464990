// expect: FVC0001
// why: the forward piece of the east face was dropped, so 0.5*Max(u[•],0)² enters cell i through its west face and leaves no cell.
using System;

namespace Corpus.Burgers1D;

/// <summary>Explicit Burgers step with the Engquist-Osher flux split, f+(u) = max(u,0)²/2, f-(u) = min(u,0)²/2.</summary>
public static class BurgersEngquistOsher
{
    [FvGen.ConservativeUpdate]
    public static void Advance(double[] u, double[] next, double dt, double dx)
    {
        double lambda = dt / dx;
        for (int i = 1; i < u.Length - 1; i++)
        {
            double forwardHere = Math.Max(u[i], 0.0);
            double forwardWest = Math.Max(u[i - 1], 0.0);
            double backwardHere = Math.Min(u[i], 0.0);
            double backwardEast = Math.Min(u[i + 1], 0.0);

            // F(i+1/2) = f+(u[i]) + f-(u[i+1]);  F(i-1/2) = f+(u[i-1]) + f-(u[i]).
            double eastFace = 0.5 * backwardEast * backwardEast;
            double westFace = 0.5 * forwardWest * forwardWest + 0.5 * backwardHere * backwardHere;
            next[i] = u[i] - lambda * (eastFace - westFace);
        }
    }
}

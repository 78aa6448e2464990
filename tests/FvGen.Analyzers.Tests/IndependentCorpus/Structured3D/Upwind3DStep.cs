// expect: none
// why: the old-state class u[•,•,•] carries 1 - cx + cx - cy + cy - cz + cz = 1: each Courant number moves mass from the upwind neighbour only.
using System;

namespace Corpus.Structured3D;

/// <summary>First-order upwind step of a smoke puff in a room with a uniform draught (all velocity components positive).</summary>
public static class RoomDraughtStep
{
    [FvGen.ConservativeUpdate]
    public static void Advance(double[,,] u, double[,,] next, double cx, double cy, double cz)
    {
        for (int i = 1; i < u.GetLength(0); i++)
        {
            for (int j = 1; j < u.GetLength(1); j++)
            {
                for (int k = 1; k < u.GetLength(2); k++)
                {
                    double here = u[i, j, k];
                    next[i, j, k] = here
                        - cx * (here - u[i - 1, j, k])
                        - cy * (here - u[i, j - 1, k])
                        - cz * (here - u[i, j, k - 1]);
                }
            }
        }
    }
}

// expect: FVC0002
// why: the second difference ends in - q[i - 1], so the old-state weights sum to 1 - c*c instead of 1.
using System;

namespace Corpus.Advection1D;

/// <summary>Lax-Wendroff step for a passive scalar on a uniform grid, linear advection with Courant number c.</summary>
public static class ScalarLaxWendroff
{
    [FvGen.ConservativeUpdate]
    public static void Advance(double[] q, double[] next, double c)
    {
        double half = 0.5 * c;
        double halfSquare = 0.5 * c * c;
        for (int i = 1; i < q.Length - 1; i++)
        {
            next[i] = q[i]
                - half * (q[i + 1] - q[i - 1])
                + halfSquare * (q[i + 1] - 2 * q[i] - q[i - 1]);
        }
    }
}

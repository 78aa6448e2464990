// expect: FVC0100
// why: the upwind cell of each face is chosen per face from the sign of flow[f], so the index read (i - 1 or i, i or i + 1) depends on data and the checker must say it did not analyse the loop.
using System;

namespace Corpus.Advection1D;

/// <summary>Dye carried down a straight flume at a steady positive velocity; first-order upwind rate.</summary>
public static class DyeFlumeUpwind
{
    [FvGen.ConservativeUpdate]
    public static void Rate(double[] dye, [FvGen.FaceData] double[] flow, double[] rate, double dx)
    {
        // flow[i] is the velocity through the face between cells i-1 and i; it may reverse with the tide.
        for (int i = 1; i < dye.Length - 1; i++)
        {
            int upwindWest = flow[i] >= 0 ? i - 1 : i;
            int upwindEast = flow[i + 1] >= 0 ? i : i + 1;
            rate[i] = (flow[i] * dye[upwindWest] - flow[i + 1] * dye[upwindEast]) / dx;
        }
    }
}

// expect: FVC0002
// why: the upwind difference became a sum, so the class dye[•] collects -velocity/dx - velocity/dx instead of cancelling.
using System;

namespace Corpus.Advection1D;

/// <summary>Dye carried down a straight flume at a steady positive velocity; first-order upwind rate.</summary>
public static class DyeFlumeUpwind
{
    [FvGen.ConservativeUpdate]
    public static void Rate(double[] dye, double[] rate, double velocity, double dx)
    {
        // Cell 0 is an inflow ghost; the rate of the interior cells only.
        for (int i = 1; i < dye.Length; i++)
        {
            rate[i] = -velocity * (dye[i] + dye[i - 1]) / dx;
        }
    }
}

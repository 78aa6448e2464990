// expect: FVC0002
// why: without the parentheses only dye[i - 1] is divided by dx, so the class dye[•] collects -velocity - 1/dx, which does not cancel.
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
            rate[i] = -velocity * dye[i] - dye[i - 1] / dx;
        }
    }
}

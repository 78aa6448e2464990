// expect: none
// why: the conduction stencil carries the old state with weight 1 + r·(1 - 2 + 1) = 1, and the Joule heating term reads only heating[i] of the target cell.
using System;

namespace Corpus.Sources;

/// <summary>Explicit heat step in a current-carrying busbar with Joule heating per cell.</summary>
public static class BusbarHeatingStep
{
    [FvGen.ConservativeUpdate]
    public static void Advance(double[] T, double[] heating, double[] next, double r, double dt, double rhoCp)
    {
        for (int i = 1; i < T.Length - 1; i++)
        {
            double conduction = r * (T[i + 1] - 2.0 * T[i] + T[i - 1]);
            double joule = dt * heating[i] / rhoCp;
            next[i] = T[i] + conduction + joule;
        }
    }
}

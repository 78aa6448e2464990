// expect: FVC0001
// why: the Joule term reads heating[i + 1], so it is no source of cell i and the term heating[•+1] enters with no counterpart.
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
            double joule = dt * heating[i + 1] / rhoCp;
            next[i] = T[i] + conduction + joule;
        }
    }
}

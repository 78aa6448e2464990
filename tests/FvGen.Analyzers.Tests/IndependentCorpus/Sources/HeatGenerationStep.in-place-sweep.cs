// expect: FVC0005
// why: writing T[i] in the ascending loop makes cell i read T[i - 1] already advanced, so the face between them sees two different states.
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
            T[i] = T[i] + conduction + joule;
        }
    }
}

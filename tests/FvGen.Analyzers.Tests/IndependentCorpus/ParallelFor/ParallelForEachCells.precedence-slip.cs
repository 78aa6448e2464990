// expect: FVC0002
// why: without the parentheses only east is divided by dx, so LaxFriedrichs(q[•], q[•+1], speed) collects +1 - 1/dx instead of cancelling.
using System;
using System.Collections.Generic;
using System.Threading.Tasks;

namespace Corpus.ParallelFor;

/// <summary>Rate only on the active (wet) cells of a drainage channel, parallel over an index list.</summary>
public static class DrainageActiveCells
{
    [FvGen.NumericalFlux]
    public static double LaxFriedrichs(double left, double right, double speed) =>
        0.5 * (left + right) * speed - 0.5 * speed * (right - left);

    [FvGen.ConservativeUpdate]
    public static void Rate(IReadOnlyList<int> activeCells, double[] q, double[] rate, double speed, double dx)
    {
        Parallel.ForEach(activeCells, i =>
        {
            double east = LaxFriedrichs(q[i], q[i + 1], speed);
            double west = LaxFriedrichs(q[i - 1], q[i], speed);
            rate[i] = west - east / dx;
        });
    }
}

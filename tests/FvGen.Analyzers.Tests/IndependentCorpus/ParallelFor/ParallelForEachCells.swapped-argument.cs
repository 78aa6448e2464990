// expect: FVC0003
// why: the west face is evaluated as LaxFriedrichs(q[i], q[i - 1], speed), so the two cells of face i-1/2 pass its states in different orders.
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
            double west = LaxFriedrichs(q[i], q[i - 1], speed);
            rate[i] = (west - east) / dx;
        });
    }
}

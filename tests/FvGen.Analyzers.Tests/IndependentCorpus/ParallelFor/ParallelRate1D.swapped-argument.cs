// expect: FVC0003
// why: the east face is evaluated as Hllish(density[i + 1], density[i]), in the opposite order from the west face of cell i+1.
using System;
using System.Threading.Tasks;

namespace Corpus.ParallelFor;

/// <summary>Traffic density on a ring-road segment, rate computed in parallel over cells (LWR model, invented closure).</summary>
public static class RingRoadRate
{
    /// <summary>Greenshields flux f(ρ) = ρ(1 - ρ) with a Rusanov-type dissipation, density scaled to [0, 1].</summary>
    [FvGen.NumericalFlux]
    public static double Hllish(double left, double right)
    {
        double speed = Math.Max(Math.Abs(1.0 - 2.0 * left), Math.Abs(1.0 - 2.0 * right));
        return 0.5 * (left * (1.0 - left) + right * (1.0 - right)) - 0.5 * speed * (right - left);
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] density, double[] rate, double dx)
    {
        Parallel.For(1, density.Length - 1, i =>
        {
            rate[i] = -(Hllish(density[i + 1], density[i]) - Hllish(density[i - 1], density[i])) / dx;
        });
    }
}

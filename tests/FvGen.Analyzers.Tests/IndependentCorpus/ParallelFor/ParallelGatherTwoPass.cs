// expect: none
// why: the first parallel loop fills the face buffer once per face; the second gathers flux[i] - flux[i + 1] per cell, so the face data cancels between neighbours and the result does not depend on the thread count.
using System;
using System.Threading.Tasks;

namespace Corpus.ParallelFor;

/// <summary>Parallel gather for ash transport in a flue duct: face fluxes first, then each cell sums its two faces.</summary>
public static class FlueAshGather
{
    [FvGen.NumericalFlux]
    public static double Rusanov(double left, double right, double velocity) =>
        0.5 * velocity * (left + right) - 0.5 * Math.Abs(velocity) * (right - left);

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] ash, double[] rate, double velocity, double dx)
    {
        int n = ash.Length;
        var flux = new double[n + 1];
        Parallel.For(1, n, f =>
        {
            flux[f] = Rusanov(ash[f - 1], ash[f], velocity);
        });

        Parallel.For(1, n - 1, i =>
        {
            rate[i] = (flux[i] - flux[i + 1]) / dx;
        });
    }
}

// expect: FVC0002
// why: the outflow is counted twice, so flux[•] collects +1/dx - 2/dx instead of cancelling.
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
            rate[i] = (flux[i] - 2.0 * flux[i + 1]) / dx;
        });
    }
}

// expect: FVC0001
// why: the downstream face flux[f] was dropped, so what enters cell c through flux[f - 1] leaves no cell.
using System;

namespace Corpus.TwoPass;

/// <summary>Ice-slurry transport in a district-cooling pipe; the cell loop walks cells and downstream faces in lockstep.</summary>
public static class IceSlurryRate
{
    [FvGen.NumericalFlux]
    public static double Upwind(double left, double right, double velocity) =>
        velocity >= 0 ? velocity * left : velocity * right;

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] ice, double[] rate, double velocity, double dx)
    {
        int n = ice.Length;
        var flux = new double[n + 1];
        for (int f = 1; f < n; f++)
        {
            flux[f] = Upwind(ice[f - 1], ice[f], velocity);
        }

        for (int c = 0, f = 1; c < n; c++, f++)
        {
            rate[c] = flux[f - 1] / dx;
        }
    }
}

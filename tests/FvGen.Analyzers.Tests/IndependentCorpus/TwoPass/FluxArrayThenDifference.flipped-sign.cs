// expect: FVC0002
// why: both faces are added, so flux[•] collects +2/dx instead of cancelling.
using System;

namespace Corpus.TwoPass;

/// <summary>Snow-melt water moving down a hillslope soil layer: face fluxes, then cell rates.</summary>
public static class HillslopeRate
{
    [FvGen.NumericalFlux]
    public static double Upwind(double upslope, double downslope, double velocity) =>
        velocity >= 0 ? velocity * upslope : velocity * downslope;

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double velocity, double dx)
    {
        int n = u.Length;
        var flux = new double[n + 1];
        for (int f = 1; f < n; f++)
        {
            flux[f] = Upwind(u[f - 1], u[f], velocity);
        }

        for (int i = 1; i < n - 1; i++)
        {
            rate[i] = (flux[i] + flux[i + 1]) / dx;
        }
    }
}

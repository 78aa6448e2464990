// expect: FVC0005
// why: the flux pass was fused into an in-place update, so the west face of cell i is evaluated from u[i - 1] after it was already advanced.
using System;

namespace Corpus.TwoPass;

/// <summary>Snow-melt water moving down a hillslope soil layer: face fluxes, then cell rates.</summary>
public static class HillslopeRate
{
    [FvGen.NumericalFlux]
    public static double Upwind(double upslope, double downslope, double velocity) =>
        velocity >= 0 ? velocity * upslope : velocity * downslope;

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double velocity, double dt, double dx)
    {
        int n = u.Length;
        for (int i = 1; i < n - 1; i++)
        {
            u[i] += dt * (Upwind(u[i - 1], u[i], velocity) - Upwind(u[i], u[i + 1], velocity)) / dx;
        }
    }
}

// expect: FVC0005
// why: without the separate flux pass, u[i] is overwritten while cell i+1 still needs the old u[i] for its west face, so the two sides of that face see different states.
using System;

namespace Corpus.TwoPass;

/// <summary>In-place explicit step of a dye in a microfluidic channel, safe because the fluxes are frozen first.</summary>
public static class MicrochannelInPlaceStep
{
    [FvGen.NumericalFlux]
    public static double Central(double left, double right, double velocity, double diffusivity, double dx) =>
        0.5 * velocity * (left + right) - diffusivity * (right - left) / dx;

    [FvGen.ConservativeUpdate]
    public static void Advance(double[] u, double velocity, double diffusivity, double dt, double dx)
    {
        int n = u.Length;
        double ratio = dt / dx;
        for (int i = 1; i < n - 1; i++)
        {
            u[i] -= ratio * (Central(u[i], u[i + 1], velocity, diffusivity, dx) - Central(u[i - 1], u[i], velocity, diffusivity, dx));
        }
    }
}

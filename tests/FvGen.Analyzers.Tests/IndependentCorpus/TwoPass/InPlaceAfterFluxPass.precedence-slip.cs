// expect: FVC0002
// why: the parentheses were lost, so flux[•] is weighted -dt/dx at face i+1 but +1 at face i.
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
        Span<double> flux = new double[n + 1];
        for (int f = 1; f < n; f++)
        {
            flux[f] = Central(u[f - 1], u[f], velocity, diffusivity, dx);
        }

        double ratio = dt / dx;
        for (int i = 1; i < n - 1; i++)
        {
            u[i] -= ratio * flux[i + 1] - flux[i];
        }
    }
}

// Advection-diffusion-reaction rate: upwind advection, central diffusion, first-order decay as a source.
// mutant: FVC0002 diffusion-weight: `+ nu * (u[i + 1] - 2 * u[i] + u[i - 1]) / (dx * dx)` -> `+ nu * (u[i + 1] - 2 * u[i] + u[i - 1]) / (dx * dx) + nu * u[i + 1] / dx`
// mutant: FVC0002 advection-slip: `-a * (u[i] - u[i - 1]) / dx` -> `-a * (u[i] - 2 * u[i - 1]) / dx`
// mutant: FVC0005 in-place: `r[i] = -a` -> `u[i] = -a`
using System;
using FvGen;

public static class AdvectionDiffusionReaction
{
    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double a, double nu, double decay, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            r[i] = -a * (u[i] - u[i - 1]) / dx + nu * (u[i + 1] - 2 * u[i] + u[i - 1]) / (dx * dx) - decay * u[i];
        }
    }
}

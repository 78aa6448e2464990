// Lax-Friedrichs explicit step for a scalar law with flux f(u) = u^2 / 2, written in update form.
// mutant: FVC0002 wrong-weight: `0.5 * (u[i - 1] + u[i + 1])` -> `0.25 * (u[i - 1] + u[i + 1])`
// mutant: FVC0005 in-place: `un[i] = 0.5` -> `u[i] = 0.5`
// mutant: FVC0003 inlined-flux: `- Flux(u[i - 1]))` -> `- u[i - 1] * u[i - 1])`
using System;
using FvGen;

public static class LaxFriedrichs
{
    private static double Flux(double u) => 0.5 * u * u;

    [ConservativeUpdate]
    public static void Step(double[] u, double[] un, double dt, double dx)
    {
        double lambda = dt / dx;
        for (int i = 1; i < u.Length - 1; i++)
        {
            un[i] = 0.5 * (u[i - 1] + u[i + 1]) - 0.5 * lambda * (Flux(u[i + 1]) - Flux(u[i - 1]));
        }
    }
}

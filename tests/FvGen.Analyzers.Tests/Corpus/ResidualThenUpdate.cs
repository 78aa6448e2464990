// Residual in one loop, forward Euler update from it in the next: the residual is cell data.
// mutant: FVC0001 dropped-term: `-(Upwind(u[i], u[i + 1], a) - Upwind(u[i - 1], u[i], a)) / dx` -> `-Upwind(u[i], u[i + 1], a) / dx`
// mutant: FVC0003 swapped-argument: `Upwind(u[i - 1], u[i], a)` -> `Upwind(u[i], u[i - 1], a)`
// mutant: FVC0005 in-place: `un[i] = u[i] + dt * res[i];` -> `u[i] = u[i - 1] + dt * res[i];`
using System;
using FvGen;

public static class ResidualUpdate
{
    private static double Upwind(double l, double r, double a) => a >= 0 ? a * l : a * r;

    [ConservativeUpdate]
    public static void Step(double[] u, double[] un, double[] res, double a, double dt, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            res[i] = -(Upwind(u[i], u[i + 1], a) - Upwind(u[i - 1], u[i], a)) / dx;
        }

        for (int i = 1; i < u.Length - 1; i++)
        {
            un[i] = u[i] + dt * res[i];
        }
    }
}

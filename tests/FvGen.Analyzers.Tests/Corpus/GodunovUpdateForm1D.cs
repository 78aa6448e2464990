// Explicit Godunov step for Burgers' equation in update form, new and old states in separate arrays.
// mutant: FVC0005 in-place: `un[i] = u[i]` -> `u[i] = u[i]`
// mutant: FVC0003 swapped-argument: `Godunov(u[i - 1], u[i])` -> `Godunov(u[i], u[i - 1])`
// mutant: FVC0002 weight-on-one-flux: `un[i] = u[i] - lambda * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]));` -> `un[i] = u[i] - lambda * Godunov(u[i], u[i + 1]) + dt * Godunov(u[i - 1], u[i]);`
using System;
using FvGen;

public static class GodunovStep
{
    private static double Godunov(double l, double r)
    {
        double fl = 0.5 * l * l, fr = 0.5 * r * r;
        if (l <= r) return l > 0 ? fl : (r < 0 ? fr : 0.0);
        return Math.Max(fl, fr);
    }

    [ConservativeUpdate]
    public static void Step(double[] u, double[] un, double dt, double dx)
    {
        double lambda = dt / dx;
        for (int i = 1; i < u.Length - 1; i++)
        {
            un[i] = u[i] - lambda * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]));
        }
    }
}

// Inviscid Burgers, first-order Godunov flux, semi-discrete rate on a uniform grid.
// mutant: FVC0003 swapped-argument: `Godunov(u[i - 1], u[i])` -> `Godunov(u[i], u[i - 1])`
// mutant: FVC0002 flipped-sign: `) - Godunov(` -> `) + Godunov(`
// mutant: FVC0003 wrong-stencil: `Godunov(u[i], u[i + 1])` -> `Godunov(u[i], u[i + 2])`
// mutant: FVC0001 dropped-term: `-(Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i])) / dx` -> `-Godunov(u[i], u[i + 1]) / dx`
using System;
using FvGen;

public static class BurgersRate
{
    public static double Godunov(double left, double right)
    {
        if (left <= right)
        {
            if (left > 0) return 0.5 * left * left;
            if (right < 0) return 0.5 * right * right;
            return 0.0;
        }

        return Math.Max(0.5 * left * left, 0.5 * right * right);
    }

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            r[i] = -(Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i])) / dx;
        }
    }
}

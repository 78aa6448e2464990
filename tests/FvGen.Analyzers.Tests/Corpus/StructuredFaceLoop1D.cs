// 1-D face loop: each interior face flux evaluated once, taken from the left cell, given to the right.
// mutant: FVC0004 one-sided: `        r[i] += f / dx;` -> ``
// mutant: FVC0004 self-cancelling: `r[i] += f / dx;` -> `r[i - 1] += f / dx;`
// mutant: FVC0004 unequal-weights: `r[i] += f / dx;` -> `r[i] += f / (2 * dx);`
using System;
using FvGen;

public static class FaceLoop1D
{
    private static double Roe(double l, double r)
    {
        double a = 0.5 * (l + r);
        return 0.25 * (l * l + r * r) - 0.5 * Math.Abs(a) * (r - l);
    }

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double dx)
    {
        for (int i = 1; i < u.Length; i++)
        {
            double f = Roe(u[i - 1], u[i]);
            r[i - 1] -= f / dx;
            r[i] += f / dx;
        }
    }
}

// The classic trailing-index loop: im follows i (im = i, i++), so im = i - 1 after the first cell.
// mutant: FVC0004 re-evaluated-swapped: `r[im] -= f / dx;` -> `r[im] -= Flux(u[i], u[im]) / dx;`
// mutant: FVC0004 dropped-term: `r[im] -= f / dx;` -> `r[im] -= 0.0;`
// mutant: FVC0004 unequal-weights: `r[i] += f / dx;` -> `r[i] += f / dx / dx;`
using System;
using FvGen;

public static class TrailingIndex
{
    private static double Flux(double l, double r) => 0.5 * (l + r);

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double dx)
    {
        for (int i = 1, im = 0; i < u.Length; im = i, i++)
        {
            double f = Flux(u[im], u[i]);
            r[im] -= f / dx;
            r[i] += f / dx;
        }
    }
}

// 2-D scatter: an x-face loop and a y-face loop, each face flux applied to the cells on its two sides.
// mutant: FVC0004 one-sided-y: `                r[i, j] += gy;` -> ``
// mutant: FVC0004 self-cancelling-x: `r[i, j] += gx;` -> `r[i - 1, j] += gx;`
// mutant: FVC0004 wrong-cell-weight: `r[i, j - 1] -= gy;` -> `r[i, j - 1] -= gy * dx;`
using System;
using FvGen;

public static class FaceLoops2D
{
    private static double Upwind(double l, double r, double a) => a >= 0 ? a * l : a * r;

    [ConservativeUpdate]
    public static void Rate(double[,] u, double[,] r, double ax, double ay, double dx, double dy)
    {
        int nx = u.GetLength(0), ny = u.GetLength(1);
        for (int j = 0; j < ny; j++)
        {
            for (int i = 1; i < nx; i++)
            {
                double gx = Upwind(u[i - 1, j], u[i, j], ax) / dx;
                r[i - 1, j] -= gx;
                r[i, j] += gx;
            }
        }

        for (int j = 1; j < ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                double gy = Upwind(u[i, j - 1], u[i, j], ay) / dy;
                r[i, j - 1] -= gy;
                r[i, j] += gy;
            }
        }
    }
}

// 3-D heat equation rate on a uniform box, seven-point Laplacian on a [,,] array.
// mutant: FVC0002 wrong-spacing: `(t[i, j + 1, k] - 2 * t[i, j, k] + t[i, j - 1, k]) / (dy * dy)` -> `(t[i, j + 1, k] - 2 * t[i, j, k] + t[i, j - 1, k] / (dy * dy))`
// mutant: FVC0002 wrong-weight: `- 2 * t[i, j, k] + t[i, j, k - 1]` -> `- t[i, j, k] + t[i, j, k - 1]`
// mutant: FVC0005 in-place: `r[i, j, k] = alpha` -> `t[i, j, k] = alpha`
using System;
using FvGen;

public static class Heat3D
{
    [ConservativeUpdate]
    public static void Rate(double[,,] t, double[,,] r, double alpha, double dx, double dy, double dz)
    {
        int nx = t.GetLength(0), ny = t.GetLength(1), nz = t.GetLength(2);
        for (int k = 1; k < nz - 1; k++)
            for (int j = 1; j < ny - 1; j++)
                for (int i = 1; i < nx - 1; i++)
                {
                    r[i, j, k] = alpha * ((t[i + 1, j, k] - 2 * t[i, j, k] + t[i - 1, j, k]) / (dx * dx)
                        + (t[i, j + 1, k] - 2 * t[i, j, k] + t[i, j - 1, k]) / (dy * dy)
                        + (t[i, j, k + 1] - 2 * t[i, j, k] + t[i, j, k - 1]) / (dz * dz));
                }
    }
}

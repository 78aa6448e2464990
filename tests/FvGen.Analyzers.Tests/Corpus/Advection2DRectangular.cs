// 2-D rate from face flux arrays on a rectangular grid, x-faces fx[i, j], y-faces fy[i, j].
// mutant: FVC0001 dropped-term: `- (fy[i, j + 1] - fy[i, j]) / dy` -> `- fy[i, j + 1] / dy`
// mutant: FVC0002 wrong-spacing: `- fx[i, j]) / dx` -> `) / dx + fx[i, j] / dy`
// mutant: FVC0001 swapped-index: `fy[i, j + 1]` -> `fy[j + 1, i]`
using System;
using FvGen;

public static class Advection2D
{
    [ConservativeUpdate]
    public static void Rate([FaceData] double[,] fx, [FaceData] double[,] fy, double[,] r, double dx, double dy)
    {
        int nx = r.GetLength(0), ny = r.GetLength(1);
        for (int j = 0; j < ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                r[i, j] = -(fx[i + 1, j] - fx[i, j]) / dx - (fy[i, j + 1] - fy[i, j]) / dy;
            }
        }
    }
}

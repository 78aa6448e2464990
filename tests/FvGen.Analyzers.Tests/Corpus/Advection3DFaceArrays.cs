// 3-D rate from face flux arrays in x, y and z.
// mutant: FVC0001 dropped-z: `- (fz[i, j, k + 1] - fz[i, j, k]) / dz` -> `- fz[i, j, k + 1] / dz`
// mutant: FVC0002 wrong-spacing: `(fy[i, j + 1, k] - fy[i, j, k]) / dy` -> `(fy[i, j + 1, k] / dy - fy[i, j, k] / dz)`
// mutant: FVC0001 wrong-direction: `fz[i, j, k + 1]` -> `fz[i, k + 1, j]`
using System;
using FvGen;

public static class Advection3D
{
    [ConservativeUpdate]
    public static void Rate([FaceData] double[,,] fx, [FaceData] double[,,] fy, [FaceData] double[,,] fz, double[,,] r, double dx, double dy, double dz)
    {
        for (int i = 0; i < r.GetLength(0); i++)
            for (int j = 0; j < r.GetLength(1); j++)
                for (int k = 0; k < r.GetLength(2); k++)
                    r[i, j, k] = -(fx[i + 1, j, k] - fx[i, j, k]) / dx - (fy[i, j + 1, k] - fy[i, j, k]) / dy - (fz[i, j, k + 1] - fz[i, j, k]) / dz;
    }
}

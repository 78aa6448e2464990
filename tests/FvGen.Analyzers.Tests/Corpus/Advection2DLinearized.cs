// 2-D rate on flat arrays: cells c = j*nx + i, x-faces j*(nx+1) + i, y-faces j*nx + i (rows of ny+1).
// mutant: FVC0001 wrong-stride: `fx[j * (nx + 1) + i]) / dx` -> `fx[j * nx + i]) / dx`
// mutant: FVC0001 wrong-row: `fy[(j + 1) * nx + i]` -> `fy[(j + 1) * (nx + 1) + i]`
// mutant: FVC0002 flipped-sign: `- fy[j * nx + i]) / dy` -> `+ fy[j * nx + i]) / dy`
using System;
using FvGen;

public static class FlatAdvection
{
    [ConservativeUpdate]
    public static void Rate([FaceData] double[] fx, [FaceData] double[] fy, double[] r, int nx, int ny, double dx, double dy)
    {
        for (int j = 0; j < ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                r[j * nx + i] = -(fx[j * (nx + 1) + i + 1] - fx[j * (nx + 1) + i]) / dx
                    - (fy[(j + 1) * nx + i] - fy[j * nx + i]) / dy;
            }
        }
    }
}

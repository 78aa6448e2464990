// expect: FVC0001
// why: the bottom face term fz[i, j, k] is gone, so fz[i, j, k + 1] leaves every cell with -1/dz and no cell receives it.
using System;

namespace Corpus.Structured3D;

/// <summary>Rate of a dissolved oxygen field in a rectangular aeration tank from three face-flux arrays.</summary>
public static class AerationTankRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate(
        [FvGen.FaceData] double[,,] fx, [FvGen.FaceData] double[,,] fy, [FvGen.FaceData] double[,,] fz,
        double[,,] rate, double dx, double dy, double dz)
    {
        int nx = rate.GetLength(0), ny = rate.GetLength(1), nz = rate.GetLength(2);
        for (int i = 0; i < nx; i++)
        {
            for (int j = 0; j < ny; j++)
            {
                for (int k = 0; k < nz; k++)
                {
                    rate[i, j, k] =
                        -(fx[i + 1, j, k] - fx[i, j, k]) / dx
                        - (fy[i, j + 1, k] - fy[i, j, k]) / dy
                        - fz[i, j, k + 1] / dz;
                }
            }
        }
    }
}

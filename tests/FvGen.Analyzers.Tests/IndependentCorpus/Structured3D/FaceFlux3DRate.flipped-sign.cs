// expect: FVC0002
// why: the y difference became a sum, so fy[•,•,•] collects -2/dy instead of cancelling.
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
                        - (fy[i, j + 1, k] + fy[i, j, k]) / dy
                        - (fz[i, j, k + 1] - fz[i, j, k]) / dz;
                }
            }
        }
    }
}

// expect: FVC0001
// why: the west x-face term fx[xFace] was dropped, so fx[xFace + 1] leaves every cell and enters none.
using System;

namespace Corpus.Structured3D;

/// <summary>Rate of a coolant scalar in a heat-exchanger core from linearised face-flux spans.</summary>
public static class ExchangerCoreRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate(
        [FvGen.FaceData] ReadOnlySpan<double> fx,
        [FvGen.FaceData] ReadOnlySpan<double> fy,
        [FvGen.FaceData] ReadOnlySpan<double> fz,
        Span<double> rate, int nx, int ny, int nz, double dx, double dy, double dz)
    {
        for (int k = 0; k < nz; k++)
        {
            for (int j = 0; j < ny; j++)
            {
                for (int i = 0; i < nx; i++)
                {
                    int cell = (k * ny + j) * nx + i;
                    int xFace = (k * ny + j) * (nx + 1) + i;
                    int yFace = (k * (ny + 1) + j) * nx + i;
                    int zFace = cell;
                    rate[cell] =
                        -fx[xFace + 1] / dx
                        + (fy[yFace] - fy[yFace + nx]) / dy
                        + (fz[zFace] - fz[zFace + nx * ny]) / dz;
                }
            }
        }
    }
}

// expect: FVC0001
// why: the north y-face is read at yFace + ny instead of yFace + nx; ny is no lattice shift of the y-face map (k*(ny+1) + j)*nx + i, so fy[yFace] and fy[yFace + ny] each lack a counterpart.
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
                        (fx[xFace] - fx[xFace + 1]) / dx
                        + (fy[yFace] - fy[yFace + ny]) / dy
                        + (fz[zFace] - fz[zFace + nx * ny]) / dz;
                }
            }
        }
    }
}

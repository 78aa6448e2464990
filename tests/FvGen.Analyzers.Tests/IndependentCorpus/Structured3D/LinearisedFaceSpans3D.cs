// expect: none
// why: the x-face flux is read at (k*ny + j)*(nx+1) + i and + i + 1, one lattice class with weights +1/dx and -1/dx; y and z likewise with their own strides.
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
                        + (fy[yFace] - fy[yFace + nx]) / dy
                        + (fz[zFace] - fz[zFace + nx * ny]) / dz;
                }
            }
        }
    }
}

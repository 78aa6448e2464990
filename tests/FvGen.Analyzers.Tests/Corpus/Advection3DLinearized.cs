// 3-D rate on a flat array with symbolic strides: cell (i, j, k) at (k*ny + j)*nx + i, face fluxes cell-aligned.
// mutant: FVC0001 wrong-plane-stride: `fz[c + nx * ny]` -> `fz[c + ny]`
// mutant: FVC0002 wrong-spacing: `(fy[c + nx] - fy[c]) / dy` -> `(fy[c + nx] / dy - fy[c] / dz)`
// mutant: FVC0001 dropped-x: `(fx[c + 1] - fx[c]) / dx` -> `fx[c + 1] / dx`
using System;
using FvGen;

public static class Advection3DFlat
{
    [ConservativeUpdate]
    public static void Rate([FaceData] double[] fx, [FaceData] double[] fy, [FaceData] double[] fz, double[] r, int nx, int ny, int nz, double dx, double dy, double dz)
    {
        for (int k = 0; k < nz; k++)
        {
            for (int j = 0; j < ny; j++)
            {
                for (int i = 0; i < nx; i++)
                {
                    int c = (k * ny + j) * nx + i;
                    r[c] = -(fx[c + 1] - fx[c]) / dx - (fy[c + nx] - fy[c]) / dy - (fz[c + nx * ny] - fz[c]) / dz;
                }
            }
        }
    }
}

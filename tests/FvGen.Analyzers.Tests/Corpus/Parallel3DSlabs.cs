// 3-D flux-difference rate, z-slabs in parallel, y and x in nested loops; face arrays are face data.
// mutant: FVC0001 dropped-y: `- (gy[i, j + 1, k] - gy[i, j, k]) * invDy` -> `- gy[i, j + 1, k] * invDy`
// mutant: FVC0002 wrong-inverse: `(gx[i + 1, j, k] - gx[i, j, k]) * invDx` -> `(gx[i + 1, j, k] - gx[i, j, k] * 2) * invDx`
// mutant: FVC0001 transposed: `gz[i, j, k + 1]` -> `gz[k + 1, j, i]`
using System;
using System.Threading.Tasks;
using FvGen;

public static class Slabs
{
    [ConservativeUpdate]
    public static void Rate([FaceData] double[,,] gx, [FaceData] double[,,] gy, [FaceData] double[,,] gz, double[,,] r, int nx, int ny, int nz, double dx, double dy, double dz)
    {
        double invDx = 1.0 / dx, invDy = 1.0 / dy, invDz = 1.0 / dz;
        Parallel.For(0, nz, k =>
        {
            for (int j = 0; j < ny; j++)
            {
                for (int i = 0; i < nx; i++)
                {
                    r[i, j, k] = -(gx[i + 1, j, k] - gx[i, j, k]) * invDx - (gy[i, j + 1, k] - gy[i, j, k]) * invDy - (gz[i, j, k + 1] - gz[i, j, k]) * invDz;
                }
            }
        });
    }
}

// expect: FVC0001 FVC0002
// why: the top neighbour is read at c + nx*nz instead of c + nx*ny; that offset is no lattice shift of (k*ny + j)*nx + i, so T[c + nx*nz] has no counterpart and the main class sums to 1 - r.
using System;

namespace Corpus.Structured3D;

/// <summary>Explicit heat step inside a cast steel ingot on a row-major 3-D grid.</summary>
public static class IngotCoolingStep
{
    [FvGen.ConservativeUpdate]
    public static void Advance(double[] T, double[] next, int nx, int ny, int nz, double r)
    {
        int plane = nx * ny;
        for (int k = 1; k < nz - 1; k++)
        {
            for (int j = 1; j < ny - 1; j++)
            {
                for (int i = 1; i < nx - 1; i++)
                {
                    int c = (k * ny + j) * nx + i;
                    double sum = T[c - 1] + T[c + 1] + T[c - nx] + T[c + nx] + T[c - plane] + T[c + nx * nz];
                    next[c] = T[c] + r * (sum - 6.0 * T[c]);
                }
            }
        }
    }
}

// expect: FVC0002
// why: the centre weight 4 belongs to a 2-D stencil; with six neighbours the old-state weights sum to 1 + 2r instead of 1.
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
                    double sum = T[c - 1] + T[c + 1] + T[c - nx] + T[c + nx] + T[c - plane] + T[c + plane];
                    next[c] = T[c] + r * (sum - 4.0 * T[c]);
                }
            }
        }
    }
}

// expect: FVC0001 FVC0002
// why: the north neighbour is read at c + ny instead of c + nx; ny is no lattice shift of j*nx + i, so T[c + ny] has no counterpart and the main class sums to 1 - r.
using System;
using System.Threading.Tasks;

namespace Corpus.ParallelFor;

/// <summary>Explicit heat step of a glass furnace floor, parallel over rows of a row-major grid.</summary>
public static class FurnaceFloorStep
{
    [FvGen.ConservativeUpdate]
    public static void Advance(double[] T, double[] next, int nx, int ny, double r)
    {
        Parallel.For(1, ny - 1, j =>
        {
            int row = j * nx;
            for (int i = 1; i < nx - 1; i++)
            {
                int c = row + i;
                next[c] = T[c] + r * (T[c - 1] + T[c + 1] + T[c - nx] + T[c + ny] - 4.0 * T[c]);
            }
        });
    }
}

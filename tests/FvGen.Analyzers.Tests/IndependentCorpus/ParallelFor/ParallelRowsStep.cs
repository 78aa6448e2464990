// expect: none
// why: each row runs in parallel, reading the old field and writing a separate one; all reads of T are one lattice class of j*nx + i with weights 1 + r·(4 - 4) = 1.
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
                next[c] = T[c] + r * (T[c - 1] + T[c + 1] + T[c - nx] + T[c + nx] - 4.0 * T[c]);
            }
        });
    }
}

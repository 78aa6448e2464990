// expect: FVC0005
// why: the rows write T itself while other rows and later cells read T[c - 1], T[c ± nx], so some cells see neighbours already advanced (and the result depends on the schedule).
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
                T[c] = T[c] + r * (T[c - 1] + T[c + 1] + T[c - nx] + T[c + nx] - 4.0 * T[c]);
            }
        });
    }
}

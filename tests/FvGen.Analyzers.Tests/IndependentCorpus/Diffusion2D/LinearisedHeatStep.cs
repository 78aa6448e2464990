// expect: none
// why: every read of T is T[j*nx + i + offset] with offsets 0, ±1, ±nx, one lattice class whose weights are 1 + rx·(1 - 2 + 1) + ry·(1 - 2 + 1) = 1.
using System;

namespace Corpus.Diffusion2D;

/// <summary>Explicit heat step on a row-major grid (index j*nx + i), e.g. a chip spreader plate.</summary>
public static class SpreaderPlateStep
{
    [FvGen.ConservativeUpdate]
    public static void Advance(double[] T, double[] next, int nx, int ny, double rx, double ry)
    {
        for (int j = 1; j < ny - 1; j++)
        {
            for (int i = 1; i < nx - 1; i++)
            {
                int c = j * nx + i;
                next[c] = T[c]
                    + rx * (T[c + 1] - 2.0 * T[c] + T[c - 1])
                    + ry * (T[c + nx] - 2.0 * T[c] + T[c - nx]);
            }
        }
    }
}

// 2-D diffusion on jagged rows, rows in parallel, columns in an inner loop.
// mutant: FVC0002 dropped-neighbour: `+ u[j - 1][i]` -> ``
// mutant: FVC0002 wrong-weight: `(u[j][i + 1] - 2 * u[j][i] + u[j][i - 1]) * kx` -> `(u[j][i + 1] - u[j][i] + u[j][i - 1]) * kx`
// mutant: FVC0005 in-place: `r[j][i] = ` -> `u[j][i] = `
using System;
using System.Threading.Tasks;
using FvGen;

public static class JaggedDiffusion
{
    [ConservativeUpdate]
    public static void Rate(double[][] u, double[][] r, double kx, double ky)
    {
        Parallel.For(1, u.Length - 1, j =>
        {
            for (int i = 1; i < u[j].Length - 1; i++)
            {
                r[j][i] = (u[j][i + 1] - 2 * u[j][i] + u[j][i - 1]) * kx + (u[j + 1][i] - 2 * u[j][i] + u[j - 1][i]) * ky;
            }
        });
    }
}

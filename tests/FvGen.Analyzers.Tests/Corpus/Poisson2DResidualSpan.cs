// Residual of a 2-D Poisson problem on a flat span with a charge source.
// mutant: FVC0002 sign-slip: `- 2 * phi[c] + phi[c - nx]` -> `- 2 * phi[c] - phi[c - nx]`
// mutant: FVC0002 wrong-weight: `(phi[c + 1] - 2 * phi[c] + phi[c - 1]) / (dx * dx)` -> `(phi[c + 1] - 2 * phi[c] + phi[c - 1] / (dx * dx))`
// mutant: FVC0005 in-place: `Span<double> r = residual;` -> `Span<double> r = potential;`
using System;
using FvGen;

public static class Poisson2D
{
    [ConservativeUpdate]
    public static void Residual(double[] potential, double[] charge, double[] residual, int nx, int ny, double dx, double dy, double permittivity)
    {
        ReadOnlySpan<double> phi = potential;
        Span<double> r = residual;
        for (int j = 1; j < ny - 1; j++)
        {
            for (int i = 1; i < nx - 1; i++)
            {
                int c = j * nx + i;
                r[c] = (phi[c + 1] - 2 * phi[c] + phi[c - 1]) / (dx * dx) + (phi[c + nx] - 2 * phi[c] + phi[c - nx]) / (dy * dy) + charge[c] / permittivity;
            }
        }
    }
}

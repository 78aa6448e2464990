// 2-D Burgers on a flat span (cells c = j*nx + i), inline Rusanov fluxes in x and y.
// mutant: FVC0002 wrong-weight: `- (gN - gS) / dy` -> `- (gN - 0.5 * gS) / dy`
// mutant: FVC0003 wrong-stride: `double gS = Flux(u[c - nx], u[c]);` -> `double gS = Flux(u[c - nx + 1], u[c]);`
// mutant: FVC0001 dropped-term: `-(fE - fW) / dx` -> `-fE / dx`
using System;
using FvGen;

public static class Burgers2D
{
    private static double Flux(double a, double b)
    {
        double s = Math.Max(Math.Abs(a), Math.Abs(b));
        return 0.25 * (a * a + b * b) - 0.5 * s * (b - a);
    }

    [ConservativeUpdate]
    public static void Rate(ReadOnlySpan<double> u, Span<double> r, int nx, int ny, double dx, double dy)
    {
        for (int j = 1; j < ny - 1; j++)
        {
            for (int i = 1; i < nx - 1; i++)
            {
                int c = j * nx + i;
                double fE = Flux(u[c], u[c + 1]);
                double fW = Flux(u[c - 1], u[c]);
                double gN = Flux(u[c], u[c + nx]);
                double gS = Flux(u[c - nx], u[c]);
                r[c] = -(fE - fW) / dx - (gN - gS) / dy;
            }
        }
    }
}

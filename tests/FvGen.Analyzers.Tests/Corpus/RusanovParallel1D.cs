// Rusanov (local Lax-Friedrichs) flux written inline, cells updated in parallel.
// mutant: FVC0002 wrong-weight: `- 0.5 * aL * (u[i] - u[i - 1])` -> `- aL * (u[i] - u[i - 1])`
// mutant: FVC0003 wrong-stencil: `Math.Max(Math.Abs(u[i]), Math.Abs(u[i - 1]))` -> `Math.Max(Math.Abs(u[i]), Math.Abs(u[i - 2]))`
// mutant: FVC0001 dropped-term: `0.5 * (F(u[i]) + F(u[i + 1]))` -> `0.5 * F(u[i])`
using System;
using System.Threading.Tasks;
using FvGen;

public static class RusanovParallel
{
    private static double F(double u) => 0.5 * u * u;

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double dx)
    {
        Parallel.For(1, u.Length - 1, i =>
        {
            double aR = Math.Max(Math.Abs(u[i]), Math.Abs(u[i + 1]));
            double aL = Math.Max(Math.Abs(u[i]), Math.Abs(u[i - 1]));
            double fR = 0.5 * (F(u[i]) + F(u[i + 1])) - 0.5 * aR * (u[i + 1] - u[i]);
            double fL = 0.5 * (F(u[i - 1]) + F(u[i])) - 0.5 * aL * (u[i] - u[i - 1]);
            r[i] = -(fR - fL) / dx;
        });
    }
}

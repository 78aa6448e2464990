// Kurganov-Tadmor central scheme with minmod-limited reconstruction and local speeds, Burgers' flux.
// mutant: FVC0003 stale-speed: `double aW = Math.Max(Math.Abs(wl), Math.Abs(wr));` -> `double aW = Math.Max(Math.Abs(el), Math.Abs(wr));`
// mutant: FVC0002 flipped-sign: `-(hE - hW) / dx` -> `-(hE + hW) / dx`
// mutant: FVC0001 dropped-term: `-(hE - hW) / dx` -> `-hE / dx`
using System;
using FvGen;

public static class KurganovTadmor
{
    private static double Minmod(double a, double b) => a * b <= 0 ? 0 : (Math.Abs(a) < Math.Abs(b) ? a : b);

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double dx)
    {
        for (int i = 2; i < u.Length - 2; i++)
        {
            double el = u[i] + 0.5 * Minmod(u[i] - u[i - 1], u[i + 1] - u[i]);
            double er = u[i + 1] - 0.5 * Minmod(u[i + 1] - u[i], u[i + 2] - u[i + 1]);
            double wl = u[i - 1] + 0.5 * Minmod(u[i - 1] - u[i - 2], u[i] - u[i - 1]);
            double wr = u[i] - 0.5 * Minmod(u[i] - u[i - 1], u[i + 1] - u[i]);
            double aE = Math.Max(Math.Abs(el), Math.Abs(er));
            double aW = Math.Max(Math.Abs(wl), Math.Abs(wr));
            double hE = 0.25 * (el * el + er * er) - 0.5 * aE * (er - el);
            double hW = 0.25 * (wl * wl + wr * wr) - 0.5 * aW * (wr - wl);
            r[i] = -(hE - hW) / dx;
        }
    }
}

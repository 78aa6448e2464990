// Roe flux with Harten's entropy fix for Burgers' equation, semi-discrete rate.
// mutant: FVC0003 swapped-argument: `Roe(u[i - 1], u[i], delta)` -> `Roe(u[i], u[i - 1], delta)`
// mutant: FVC0003 other-function: `Roe(u[i - 1], u[i], delta)` -> `Central(u[i - 1], u[i])`
// mutant: FVC0002 flipped-sign: `(Roe(u[i], u[i + 1], delta) - Roe(` -> `(Roe(u[i], u[i + 1], delta) + Roe(`
using System;
using FvGen;

public static class RoeBurgers
{
    private static double Central(double a, double b) => 0.25 * (a * a + b * b);

    private static double Roe(double a, double b, double delta)
    {
        double s = 0.5 * (a + b);
        double abs = Math.Abs(s);
        double q = abs < delta ? (s * s + delta * delta) / (2 * delta) : abs;
        return 0.25 * (a * a + b * b) - 0.5 * q * (b - a);
    }

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double dx, double delta)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            r[i] = -(Roe(u[i], u[i + 1], delta) - Roe(u[i - 1], u[i], delta)) / dx;
        }
    }
}

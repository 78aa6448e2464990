// Each cell sums its outward fluxes; the flux is declared antisymmetric (F(a, b, n) = -F(b, a, -n)).
// mutant: FVC0003 symmetry-not-declared: `[NumericalFlux(Antisymmetric = true)]` -> `[NumericalFlux]`
// mutant: FVC0003 wrong-normal: `Outward(u[i], u[i - 1], -1.0)` -> `Outward(u[i], u[i - 1], 1.0)`
// mutant: FVC0002 flipped-sign: `-(Outward(u[i], u[i + 1], 1.0) + Outward` -> `-(Outward(u[i], u[i + 1], 1.0) - Outward`
using System;
using FvGen;

public static class OutwardSum
{
    [NumericalFlux(Antisymmetric = true)]
    public static double Outward(double inside, double outside, double normal)
    {
        double speed = Math.Max(Math.Abs(inside), Math.Abs(outside));
        return 0.25 * normal * (inside * inside + outside * outside) - 0.5 * speed * (outside - inside);
    }

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            r[i] = -(Outward(u[i], u[i + 1], 1.0) + Outward(u[i], u[i - 1], -1.0)) / dx;
        }
    }
}

// Second-order MUSCL with an inline minmod limiter and a Rusanov flux for Burgers' equation.
// mutant: FVC0003 stale-slope: `double uLm = u[i - 1] + 0.5 * sm;` -> `double uLm = u[i - 1] + 0.5 * s0;`
// mutant: FVC0003 swapped-argument: `Rusanov(uLm, uRm)` -> `Rusanov(uRm, uLm)`
// mutant: FVC0002 flipped-sign: `-(fp - fm) / dx` -> `-(fp + fm) / dx`
using System;
using FvGen;

public static class MusclBurgers
{
    private static double Rusanov(double a, double b)
    {
        double speed = Math.Max(Math.Abs(a), Math.Abs(b));
        return 0.25 * (a * a + b * b) - 0.5 * speed * (b - a);
    }

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double dx)
    {
        for (int i = 2; i < u.Length - 2; i++)
        {
            double dm = u[i - 1] - u[i - 2], d0 = u[i] - u[i - 1], dp = u[i + 1] - u[i], dpp = u[i + 2] - u[i + 1];
            double sm = dm * d0 <= 0 ? 0 : (Math.Abs(dm) < Math.Abs(d0) ? dm : d0);
            double s0 = d0 * dp <= 0 ? 0 : (Math.Abs(d0) < Math.Abs(dp) ? d0 : dp);
            double sp = dp * dpp <= 0 ? 0 : (Math.Abs(dp) < Math.Abs(dpp) ? dp : dpp);
            double uLm = u[i - 1] + 0.5 * sm;
            double uRm = u[i] - 0.5 * s0;
            double uLp = u[i] + 0.5 * s0;
            double uRp = u[i + 1] - 0.5 * sp;
            double fm = Rusanov(uLm, uRm);
            double fp = Rusanov(uLp, uRp);
            r[i] = -(fp - fm) / dx;
        }
    }
}

// Linear acoustics (pressure and velocity), Rusanov fluxes written per field.
// mutant: FVC0002 missing-half: `(rhoC2 * (u[i + 1] + u[i]) / 2` -> `(rhoC2 * (u[i + 1] + u[i])`
// mutant: FVC0002 wrong-weight: `(p[i + 1] + p[i]) / (2 * rho)` -> `(p[i + 1] + p[i]) / (4 * rho)`
// mutant: FVC0005 in-place-velocity: `ru[i] = ` -> `u[i] = `
using System;
using FvGen;

public static class Acoustics
{
    [ConservativeUpdate]
    public static void Rate(double[] p, double[] u, double[] rp, double[] ru, double rho, double rhoC2, double c, double dx)
    {
        for (int i = 1; i < p.Length - 1; i++)
        {
            rp[i] = -((rhoC2 * (u[i + 1] + u[i]) / 2 - c * (p[i + 1] - p[i]) / 2)
                - (rhoC2 * (u[i] + u[i - 1]) / 2 - c * (p[i] - p[i - 1]) / 2)) / dx;
            ru[i] = -(((p[i + 1] + p[i]) / (2 * rho) - c * (u[i + 1] - u[i]) / 2)
                - ((p[i] + p[i - 1]) / (2 * rho) - c * (u[i] - u[i - 1]) / 2)) / dx;
        }
    }
}

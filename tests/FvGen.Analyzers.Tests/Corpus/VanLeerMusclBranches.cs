// MUSCL-Hancock-free second-order rate with a van Leer limiter written with branches, upwind flux (a > 0).
// mutant: FVC0001 stale-ratio: `phiLow = 2 * rLow / (1 + rLow);` -> `phiLow = 2 * rHere / (1 + rLow);`
// mutant: FVC0001 dropped-term: `-(a * faceHigh - a * faceLow) / dx` -> `-(a * faceHigh) / dx`
// mutant: FVC0003 wrong-stencil: `double rLow = (u[i - 1] - u[i - 2]) / dLow;` -> `double rLow = (u[i] - u[i - 2]) / dLow;`
using System;
using FvGen;

public static class VanLeerMuscl
{
    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double a, double dx)
    {
        for (int i = 2; i < u.Length - 1; i++)
        {
            double dHere = u[i + 1] - u[i];
            double dLow = u[i] - u[i - 1];
            double rHere = (u[i] - u[i - 1]) / dHere;
            double rLow = (u[i - 1] - u[i - 2]) / dLow;
            double phiHere;
            if (rHere > 0)
            {
                phiHere = 2 * rHere / (1 + rHere);
            }
            else
            {
                phiHere = 0;
            }

            double phiLow;
            if (rLow > 0)
            {
                phiLow = 2 * rLow / (1 + rLow);
            }
            else
            {
                phiLow = 0;
            }

            double slopeHere = phiHere * dHere;
            double slopeLow = phiLow * dLow;
            double faceHigh = u[i] + 0.5 * slopeHere;
            double faceLow = u[i - 1] + 0.5 * slopeLow;
            r[i] = -(a * faceHigh - a * faceLow) / dx;
        }
    }
}

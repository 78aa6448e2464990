// expect: none
// why: written out, every face term (0.5*u[•]², Max(|u[•]|,|u[•+1]|)*u[•] and *u[•+1]) appears once with -1/dx at face i+1/2 and once with +1/dx at face i-1/2.
using System;

namespace Corpus.Burgers1D;

/// <summary>Burgers rate with the Rusanov (local Lax-Friedrichs) flux written inline, as in a quick prototype.</summary>
public static class BurgersRusanovInline
{
    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            // Face i+1/2: local wave speed from the two cells that share it.
            double speedRight = Math.Max(Math.Abs(u[i]), Math.Abs(u[i + 1]));
            double fluxRight = 0.25 * (u[i] * u[i] + u[i + 1] * u[i + 1]) - 0.5 * speedRight * (u[i + 1] - u[i]);

            // Face i-1/2.
            double speedLeft = Math.Max(Math.Abs(u[i - 1]), Math.Abs(u[i]));
            double fluxLeft = 0.25 * (u[i - 1] * u[i - 1] + u[i] * u[i]) - 0.5 * speedLeft * (u[i] - u[i - 1]);

            rate[i] = -(fluxRight - fluxLeft) / dx;
        }
    }
}

// expect: FVC0001
// why: the east face lost its dissipation, so the face terms speed*u at face i-1/2 (Max(|u[•]|,|u[•+1]|)*u[•] and *u[•+1]) enter cell i with no cell losing them.
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
            double fluxRight = 0.25 * (u[i] * u[i] + u[i + 1] * u[i + 1]);

            // Face i-1/2.
            double speedLeft = Math.Max(Math.Abs(u[i - 1]), Math.Abs(u[i]));
            double fluxLeft = 0.25 * (u[i - 1] * u[i - 1] + u[i] * u[i]) - 0.5 * speedLeft * (u[i] - u[i - 1]);

            rate[i] = -(fluxRight - fluxLeft) / dx;
        }
    }
}

// expect: none
// why: the face term Godunov(u[•], u[•+1]) leaves cell i at face i+1/2 with -1/dx and enters it at face i-1/2 with +1/dx.
using System;

namespace Corpus.Burgers1D;

/// <summary>Inviscid Burgers rate for a traffic-like density wave, exact Riemann (Godunov) face flux.</summary>
public static class BurgersGodunov
{
    /// <summary>Godunov flux of f(u) = u²/2 between a left and a right state.</summary>
    [FvGen.NumericalFlux]
    public static double Godunov(double left, double right)
    {
        if (left <= right)
        {
            // Rarefaction: the minimum of f over [left, right].
            if (left > 0) return 0.5 * left * left;
            if (right < 0) return 0.5 * right * right;
            return 0.0;
        }

        // Shock: the maximum of f at the end points.
        return Math.Max(0.5 * left * left, 0.5 * right * right);
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            rate[i] = -(Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i])) / dx;
        }
    }
}

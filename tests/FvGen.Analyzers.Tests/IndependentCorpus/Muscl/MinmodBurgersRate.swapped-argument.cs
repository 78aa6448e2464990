// expect: FVC0003
// why: the west face passes its right state first, so Godunov is called with the two states of face i-1/2 in the opposite order from cell i-1.
using System;

namespace Corpus.Muscl;

/// <summary>Second-order MUSCL rate for Burgers' equation with an inline minmod limiter.</summary>
public static class MinmodBurgers
{
    [FvGen.NumericalFlux]
    public static double Godunov(double left, double right)
    {
        if (left <= right)
        {
            if (left > 0) return 0.5 * left * left;
            if (right < 0) return 0.5 * right * right;
            return 0.0;
        }

        return Math.Max(0.5 * left * left, 0.5 * right * right);
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double dx)
    {
        for (int i = 2; i < u.Length - 2; i++)
        {
            // Undivided differences around cells i-1, i, i+1.
            double dWest = u[i - 1] - u[i - 2];
            double dHere = u[i] - u[i - 1];
            double dEast = u[i + 1] - u[i];
            double dFar = u[i + 2] - u[i + 1];

            // minmod(a, b) = max(0, min(a, b)) + min(0, max(a, b)).
            double slopeWest = Math.Max(0.0, Math.Min(dWest, dHere)) + Math.Min(0.0, Math.Max(dWest, dHere));
            double slopeHere = Math.Max(0.0, Math.Min(dHere, dEast)) + Math.Min(0.0, Math.Max(dHere, dEast));
            double slopeEast = Math.Max(0.0, Math.Min(dEast, dFar)) + Math.Min(0.0, Math.Max(dEast, dFar));

            double eastFlux = Godunov(u[i] + 0.5 * slopeHere, u[i + 1] - 0.5 * slopeEast);
            double westFlux = Godunov(u[i] - 0.5 * slopeHere, u[i - 1] + 0.5 * slopeWest);
            rate[i] = -(eastFlux - westFlux) / dx;
        }
    }
}

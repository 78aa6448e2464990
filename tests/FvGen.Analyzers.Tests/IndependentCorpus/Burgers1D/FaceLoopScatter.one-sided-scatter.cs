// expect: FVC0004
// why: the face flux is taken from rate[f - 1] but the line giving it to rate[f] was lost, so the face loop reads two cells and writes one.
using System;

namespace Corpus.Burgers1D;

/// <summary>Burgers rate assembled face by face (each face flux computed once), as a generator would.</summary>
public static class BurgersFaceLoop
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
        Array.Clear(rate);
        double inverseDx = 1.0 / dx;
        // Face f lies between cells f-1 and f.
        for (int f = 1; f < u.Length; f++)
        {
            double flux = Godunov(u[f - 1], u[f]) * inverseDx;
            rate[f - 1] -= flux;
        }
    }
}

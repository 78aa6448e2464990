// expect: FVC0003
// why: the east local is LaxFriedrichsFace(u[i + 1], u[i], …) with the states reversed, so face i+1/2 is evaluated in a different order than cell i+1 evaluates it.
using System;

namespace Corpus.Burgers1D;

/// <summary>Burgers rate with a global Lax-Friedrichs flux held in well-named locals.</summary>
public static class BurgersGlobalLaxFriedrichs
{
    [FvGen.NumericalFlux]
    public static double LaxFriedrichsFace(double left, double right, double dxOverDt) =>
        0.25 * (left * left + right * right) - 0.5 * dxOverDt * (right - left);

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double dx, double dt)
    {
        double dxOverDt = dx / dt;
        for (int i = 1; i < u.Length - 1; i++)
        {
            double east = LaxFriedrichsFace(u[i + 1], u[i], dxOverDt);
            double west = LaxFriedrichsFace(u[i - 1], u[i], dxOverDt);
            rate[i] = (west - east) / dx;
        }
    }
}

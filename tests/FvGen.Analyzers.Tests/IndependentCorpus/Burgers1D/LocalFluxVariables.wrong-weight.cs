// expect: FVC0002
// why: the east flux is halved, so the face term LaxFriedrichsFace(u[•], u[•+1], dxOverDt) enters with -1/(2dx) and +1/dx.
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
            double east = LaxFriedrichsFace(u[i], u[i + 1], dxOverDt);
            double west = LaxFriedrichsFace(u[i - 1], u[i], dxOverDt);
            rate[i] = (west - 0.5 * east) / dx;
        }
    }
}

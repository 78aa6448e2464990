// expect: FVC0002
// why: the west viscous difference lost u[i - 1], so the class u[•] collects viscosity*(1 - 2)/dx² = -viscosity/dx² although its other members are still there.
using System;

namespace Corpus.Burgers1D;

/// <summary>Viscous Burgers rate: upwind convective flux plus a two-point viscous flux.</summary>
public static class ViscousBurgers
{
    /// <summary>Upwind flux by the sign of the mean state.</summary>
    [FvGen.NumericalFlux]
    public static double Upwind(double left, double right) =>
        0.5 * (left + right) >= 0 ? 0.5 * left * left : 0.5 * right * right;

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double viscosity, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            double convective = -(Upwind(u[i], u[i + 1]) - Upwind(u[i - 1], u[i])) / dx;
            double viscous = viscosity * ((u[i + 1] - u[i]) - u[i]) / (dx * dx);
            rate[i] = convective + viscous;
        }
    }
}

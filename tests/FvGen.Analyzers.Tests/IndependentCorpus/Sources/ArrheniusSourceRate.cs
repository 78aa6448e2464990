// expect: none
// why: the Rusanov face term cancels between the two faces of each cell; Consumption(T[i], fuel[i]) reads the target cell only, so it is a source.
using System;

namespace Corpus.Sources;

/// <summary>Fuel vapour transport with one-step Arrhenius consumption in a premixed burner tube.</summary>
public static class BurnerTubeRate
{
    public static double Consumption(double temperature, double fuel) =>
        2.0e6 * fuel * Math.Exp(-15000.0 / temperature);

    [FvGen.NumericalFlux]
    public static double Rusanov(double left, double right, double velocity) =>
        0.5 * velocity * (left + right) - 0.5 * Math.Abs(velocity) * (right - left);

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] fuel, double[] T, double[] rate, double velocity, double dx)
    {
        for (int i = 1; i < fuel.Length - 1; i++)
        {
            double transport = -(Rusanov(fuel[i], fuel[i + 1], velocity) - Rusanov(fuel[i - 1], fuel[i], velocity)) / dx;
            rate[i] = transport - Consumption(T[i], fuel[i]);
        }
    }
}

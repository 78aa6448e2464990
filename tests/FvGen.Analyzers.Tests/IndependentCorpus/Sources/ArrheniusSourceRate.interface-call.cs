// expect: FVC0100
// why: the consumption comes from an interface call the checker cannot see into; it may read other cells or have side effects, so the update must be reported as not analysed.
using System;

namespace Corpus.Sources;

/// <summary>A pluggable chemistry model, implemented elsewhere.</summary>
public interface IChemistry
{
    double Consumption(int cell, double temperature, double fuel);
}

/// <summary>Fuel vapour transport with one-step Arrhenius consumption in a premixed burner tube.</summary>
public static class BurnerTubeRate
{
    public static double Consumption(double temperature, double fuel) =>
        2.0e6 * fuel * Math.Exp(-15000.0 / temperature);

    [FvGen.NumericalFlux]
    public static double Rusanov(double left, double right, double velocity) =>
        0.5 * velocity * (left + right) - 0.5 * Math.Abs(velocity) * (right - left);

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] fuel, double[] T, double[] rate, double velocity, double dx, IChemistry chemistry)
    {
        for (int i = 1; i < fuel.Length - 1; i++)
        {
            double transport = -(Rusanov(fuel[i], fuel[i + 1], velocity) - Rusanov(fuel[i - 1], fuel[i], velocity)) / dx;
            rate[i] = transport - chemistry.Consumption(i, T[i], fuel[i]);
        }
    }
}

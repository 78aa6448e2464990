// expect: FVC0001 FVC0003
// why: the east energy face averages EnergyFlux of cell i with MomentumFlux of cell i+1; the two EnergyFlux(…[i]) halves then cancel inside the write, leaving +1/2·EnergyFlux(…[i-1]) and -1/2·MomentumFlux(…[i+1]), each with no counterpart, and the face i+1/2 evaluated with MomentumFlux by cell i and EnergyFlux by cell i+1 (was FVC0001 FVC0002, which counted the cancelling halves as members).
using System;

namespace Corpus.Euler1D;

/// <summary>Euler rate with one array per conserved variable and a global Lax-Friedrichs dissipation speed.</summary>
public static class NozzleStartupArrays
{
    private static double Pressure(double density, double momentum, double energy, double gamma) =>
        (gamma - 1.0) * (energy - 0.5 * momentum * momentum / density);

    private static double MomentumFlux(double density, double momentum, double energy, double gamma) =>
        momentum * momentum / density + Pressure(density, momentum, energy, gamma);

    private static double EnergyFlux(double density, double momentum, double energy, double gamma) =>
        (energy + Pressure(density, momentum, energy, gamma)) * momentum / density;

    [FvGen.ConservativeUpdate]
    public static void Rate(
        double[] rho, double[] mom, double[] energy,
        double[] rhoRate, double[] momRate, double[] energyRate,
        double gamma, double alpha, double dx)
    {
        for (int i = 1; i < rho.Length - 1; i++)
        {
            // Mass: the mass flux is the momentum itself.
            double massEast = 0.5 * (mom[i] + mom[i + 1]) - 0.5 * alpha * (rho[i + 1] - rho[i]);
            double massWest = 0.5 * (mom[i - 1] + mom[i]) - 0.5 * alpha * (rho[i] - rho[i - 1]);
            rhoRate[i] = -(massEast - massWest) / dx;

            double momEast = 0.5 * (MomentumFlux(rho[i], mom[i], energy[i], gamma) + MomentumFlux(rho[i + 1], mom[i + 1], energy[i + 1], gamma))
                - 0.5 * alpha * (mom[i + 1] - mom[i]);
            double momWest = 0.5 * (MomentumFlux(rho[i - 1], mom[i - 1], energy[i - 1], gamma) + MomentumFlux(rho[i], mom[i], energy[i], gamma))
                - 0.5 * alpha * (mom[i] - mom[i - 1]);
            momRate[i] = -(momEast - momWest) / dx;

            double energyEast = 0.5 * (EnergyFlux(rho[i], mom[i], energy[i], gamma) + MomentumFlux(rho[i + 1], mom[i + 1], energy[i + 1], gamma))
                - 0.5 * alpha * (energy[i + 1] - energy[i]);
            double energyWest = 0.5 * (EnergyFlux(rho[i - 1], mom[i - 1], energy[i - 1], gamma) + EnergyFlux(rho[i], mom[i], energy[i], gamma))
                - 0.5 * alpha * (energy[i] - energy[i - 1]);
            energyRate[i] = -(energyEast - energyWest) / dx;
        }
    }
}
